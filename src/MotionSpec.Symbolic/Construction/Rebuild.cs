namespace MotionSpec.Symbolic;

/// <summary>Rebuilds a node over new children through the canonical constructors.</summary>
internal static class Rebuild
{
    public static Expr With(Expr node, Expr[] children)
    {
        var old = node.Children;
        bool same = true;
        for (int i = 0; i < old.Length && same; i++)
        {
            same = ReferenceEquals(old[i], children[i]);
        }

        if (same)
        {
            return node;
        }

        return node switch
        {
            Sum => SumBuilder.Build(children),
            Product => ProductBuilder.Build(children),
            Power p => PowerRules.Pow(children[0], p.Exponent),
            Call { Function: Function.Atan2 } => FunctionRules.Atan2(children[0], children[1]),
            Call c => FunctionRules.Apply(c.Function, children[0]),
            _ => node,
        };
    }

    /// <summary>Maps every node bottom-up: leaves through leaf, compound nodes rebuilt over mapped children.</summary>
    public static Dictionary<Expr, Expr> BottomUp(IEnumerable<Expr> roots, Func<Expr, Expr> leaf, Func<Expr, Expr>? after = null)
    {
        var map = new Dictionary<Expr, Expr>();
        foreach (var node in DagWalk.PostOrder(roots))
        {
            Expr result;
            if (node.Children.Length == 0)
            {
                result = leaf(node);
            }
            else
            {
                var mapped = new Expr[node.Children.Length];
                for (int i = 0; i < mapped.Length; i++)
                {
                    mapped[i] = map[node.Children[i]];
                }

                result = With(node, mapped);
            }

            map[node] = after is null ? result : after(result);
        }

        return map;
    }
}
