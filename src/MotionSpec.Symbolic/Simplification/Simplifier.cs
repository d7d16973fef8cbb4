namespace MotionSpec.Symbolic;

/// <summary>
/// Simplification as done by hand, bottom-up over the DAG: in every sum, the Pythagorean identity, expansion
/// of products of sums, and taking out common factors, each kept only where it makes the sum smaller.
/// Never changes the value (the rewrites are identities) and never grows the node count (checked).
/// </summary>
public static class Simplifier
{
    /// <summary>The simplified expression (e itself when nothing helps).</summary>
    public static Expr Simplify(Expr e)
    {
        if (e is null)
        {
            throw new ArgumentNullException(nameof(e));
        }

        var map = Rebuild.BottomUp([e], leaf => leaf, SimplifyNode);
        var result = map[e];
        if (ReferenceEquals(result, e))
        {
            return e;
        }

        // Local decisions cannot see sharing elsewhere in the DAG; the whole result must not be larger.
        return ExprMetrics.NodeCount(result) <= ExprMetrics.NodeCount(e) ? result : e;
    }

    private static Expr SimplifyNode(Expr node)
    {
        if (node is not Sum s)
        {
            return node;
        }

        Expr best = s;
        int bestSize = -1;

        void Consider(Expr? candidate)
        {
            if (candidate is null || ReferenceEquals(candidate, best))
            {
                return;
            }

            if (bestSize < 0)
            {
                bestSize = LocalSize.Of(s);
            }

            int size = LocalSize.Of(candidate);
            if (size < bestSize)
            {
                best = candidate;
                bestSize = size;
            }
        }

        Consider(Pythagorean.Apply(s));
        var expanded = Expansion.Expand(s);
        if (expanded is not null)
        {
            Consider(expanded is Sum es ? Pythagorean.Apply(es) ?? es : expanded);
        }

        // Greedy factoring: take the best common factor, then try again on what is left outside.
        for (int round = 0; round < 4 && best is Sum current; round++)
        {
            var before = best;
            foreach (var candidate in CommonFactor.Candidates(current))
            {
                Consider(candidate);
            }

            if (ReferenceEquals(before, best))
            {
                break;
            }
        }

        return best;
    }

}
