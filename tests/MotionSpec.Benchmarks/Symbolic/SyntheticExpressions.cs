using MotionSpec.Symbolic;

namespace MotionSpec.Benchmarks.Symbolic;

/// <summary>Deterministic synthetic inputs for the symbolic benchmarks (a fixed seed, so every run builds the same expressions).</summary>
internal static class SyntheticExpressions
{
    /// <summary>An uncanonicalised operation tree, replayed through the smart constructors by Canonicalise.</summary>
    internal sealed record RawNode(int Op, RawNode[] Children, int Leaf);

    private static readonly Symbol[] Leaves =
    [
        Symbol.Time, Symbol.Param("L"), Symbol.Param("h"), Symbol.Coord("psi"), Symbol.Coord("psi", 1),
        Symbol.Coord("theta"), Symbol.Coord("theta", 1), Symbol.Coord("s"), Symbol.Coord("s", 1),
    ];

    /// <summary>A random operation tree of about the given number of nodes (as a tree, without sharing).</summary>
    public static RawNode RandomTree(int nodes, int seed)
    {
        var random = new Random(seed);
        return Grow(random, nodes);
    }

    private static RawNode Grow(Random random, int budget)
    {
        if (budget <= 1)
        {
            return new RawNode(0, [], random.Next(Leaves.Length + 3));
        }

        int op = 1 + random.Next(6);
        switch (op)
        {
            case 1 or 2 or 3:
                {
                    // Sum, product, difference: split the budget among two to four operands.
                    int arity = op == 3 ? 2 : 2 + random.Next(3);
                    int share = Math.Max(1, (budget - 1) / arity);
                    var children = new RawNode[arity];
                    for (int i = 0; i < arity; i++)
                    {
                        children[i] = Grow(random, share);
                    }

                    return new RawNode(op, children, 0);
                }

            default:
                return new RawNode(op, [Grow(random, budget - 1)], random.Next(3));
        }
    }

    /// <summary>Builds the canonical expression of a raw tree (iterative: trees can be deep).</summary>
    public static Expr Canonicalise(RawNode root)
    {
        var done = new Dictionary<RawNode, Expr>(ReferenceEqualityComparer.Instance);
        var stack = new Stack<(RawNode Node, bool Expanded)>();
        stack.Push((root, false));
        while (stack.Count > 0)
        {
            var (node, expanded) = stack.Pop();
            if (!expanded)
            {
                stack.Push((node, true));
                foreach (var child in node.Children)
                {
                    stack.Push((child, false));
                }

                continue;
            }

            var c = node.Children.Select(x => done[x]).ToArray();
            done[node] = node.Op switch
            {
                0 => node.Leaf < Leaves.Length ? Leaves[node.Leaf] : Expr.Number(node.Leaf - Leaves.Length + 2),
                1 => Expr.Sum(c),
                2 => Expr.Product(c),
                3 => c[0] - c[1],
                4 => node.Leaf == 0 ? Expr.Sin(c[0]) : Expr.Cos(c[0]),
                5 => Expr.Pow(c[0], node.Leaf + 2),
                _ => -c[0],
            };
        }

        return done[root];
    }

    /// <summary>f0 = psi, f(k+1) = L*sin(f(k)) + cos(f(k)): every level uses the one below twice.</summary>
    public static Expr NestedChain(int depth)
    {
        Expr f = Symbol.Coord("psi");
        var length = Symbol.Param("L");
        for (int i = 0; i < depth; i++)
        {
            f = (length * Expr.Sin(f)) + Expr.Cos(f);
        }

        return f;
    }
}
