namespace MotionSpec.Symbolic;

/// <summary>
/// The distinct-node count of the top few levels of an expression. Rewrites of one sum only change its top
/// levels, and the levels below are shared by both sides of a comparison, so this compares candidates at a
/// cost independent of the size of the whole DAG.
/// </summary>
internal static class LocalSize
{
    public const int Levels = 4;

    public static int Of(Expr e) => Of(e, int.MaxValue);

    /// <summary>The same count, but stops at <paramref name="limit"/>: a candidate that reaches it cannot win.</summary>
    public static int Of(Expr e, int limit)
    {
        var seen = new HashSet<Expr> { e };
        int numbers = 0;
        var level = new List<Expr> { e };
        var next = new List<Expr>();
        for (int depth = 0; depth < Levels && level.Count > 0; depth++)
        {
            next.Clear();
            foreach (var node in level)
            {
                foreach (var child in node.Children)
                {
                    if (seen.Add(child))
                    {
                        if (child is Number)
                        {
                            // A coefficient is part of the product that holds it, not a node a reader sees:
                            // (10*a - 7*b)/10 is no larger than a - 7*b/10.
                            numbers++;
                            continue;
                        }

                        if (seen.Count - numbers >= limit)
                        {
                            return seen.Count - numbers;
                        }

                        next.Add(child);
                    }
                }
            }

            (level, next) = (next, level);
        }

        return seen.Count - numbers;
    }
}
