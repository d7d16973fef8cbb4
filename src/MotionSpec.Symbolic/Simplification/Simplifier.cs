using System.Runtime.CompilerServices;

namespace MotionSpec.Symbolic;

/// <summary>
/// Simplification as done by hand, bottom-up over the DAG: in every sum, the Pythagorean identity, expansion
/// of products of sums, and taking out common factors, each kept only where it makes the sum smaller.
/// Never changes the value (the rewrites are identities) and never grows the node count (checked).
/// </summary>
public static class Simplifier
{
    private static readonly object MemoGate = new();

    // What each node became, kept as long as the node lives. A node's result depends on the node alone, so
    // outputs that share subexpressions (the components of one report, the reports of one spec) pay for
    // each shared node once, whichever output reaches it first; the results are the same either way.
    private static ConditionalWeakTable<Expr, Expr> _memo = new();

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
    internal static void ForgetRemembered() => _memo = new ConditionalWeakTable<Expr, Expr>();

    /// <summary>
    /// Every node rebuilt over its simplified children, then simplified itself, children first; the walk does
    /// not enter a node whose result is remembered.
    /// </summary>
    private static Expr Bottom(Expr root)
    {
        var memo = _memo;
        if (memo.TryGetValue(root, out var known))
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
                    if (memo.TryGetValue(child, out var remembered))
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
            Remember(memo, node, result);
        }

        return done[root];
    }

    private static void Remember(ConditionalWeakTable<Expr, Expr> memo, Expr node, Expr result)
    {
        lock (MemoGate)
        {
            if (!memo.TryGetValue(node, out _))
            {
                memo.Add(node, result);
            }
        }
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
