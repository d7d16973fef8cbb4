namespace MotionSpec.Symbolic;

/// <summary>
/// Simplification as done by hand, bottom-up over the DAG: in every sum, the Pythagorean identity, expansion
/// of products of sums, and taking out common factors, each kept only where it makes the sum smaller.
/// Never changes the value (the rewrites are identities) and never grows the node count (checked).
/// </summary>
public static class Simplifier
{
    // What each node became is kept on the node (Expr.SimplifiedAs). A node's result depends on the node
    // alone, so outputs that share subexpressions (the components of one report, the reports of one spec)
    // pay for each shared node once, whichever output reaches it first, and the results are the same either
    // way; for the same reason a result seen by another thread is always a right one. Forgetting moves the
    // epoch on, so older entries stop counting.
    private static int _epoch;

    /// <summary>The simplified expression (e itself when nothing helps).</summary>
    public static Expr Simplify(Expr e)
    {
        if (e is null)
        {
            throw new ArgumentNullException(nameof(e));
        }

        var result = Bottom(e);
        if (ReferenceEquals(result, e))
        {
            return e;
        }

        // Local decisions cannot see sharing elsewhere in the DAG; the whole result must not be larger.
        return ExprMetrics.NodeCount(result) <= ExprMetrics.NodeCount(e) ? result : e;
    }

    /// <summary>Forgets every remembered result, so that a benchmark can measure the work itself.</summary>
    internal static void ForgetRemembered() => Interlocked.Increment(ref _epoch);

    /// <summary>
    /// Every node rebuilt over its simplified children, then simplified itself, children first; the walk does
    /// not enter a node whose result is remembered.
    /// </summary>
    private static Expr Bottom(Expr root)
    {
        int epoch = Volatile.Read(ref _epoch);
        if (Remembered(root, epoch) is { } known)
        {
            return known;
        }

        var done = new Dictionary<Expr, Expr>();
        var stack = new Stack<(Expr Node, int Next)>();
        stack.Push((root, 0));
        while (stack.Count > 0)
        {
            var (node, next) = stack.Pop();
            var children = node.Children;
            if (next < children.Length)
            {
                stack.Push((node, next + 1));
                var child = children[next];
                if (!done.ContainsKey(child))
                {
                    if (Remembered(child, epoch) is { } remembered)
                    {
                        done[child] = remembered;
                    }
                    else
                    {
                        stack.Push((child, 0));
                    }
                }

                continue;
            }

            Expr result = node;
            if (children.Length > 0)
            {
                var mapped = new Expr[children.Length];
                for (int i = 0; i < mapped.Length; i++)
                {
                    mapped[i] = done[children[i]];
                }

                result = SimplifyNode(Rebuild.With(node, mapped));
            }

            done[node] = result;
            node.SimplifiedAs = result;
            node.SimplifiedEpoch = epoch;
        }

        return done[root];
    }

    private static Expr? Remembered(Expr node, int epoch) =>
        node.SimplifiedEpoch == epoch ? node.SimplifiedAs : null;

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

            int size = LocalSize.Of(candidate, bestSize);
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
