namespace MotionSpec.Symbolic;

/// <summary>Iterative traversals of expression DAGs: each distinct node once, children before parents, no recursion.</summary>
internal static class DagWalk
{
    /// <summary>Distinct nodes reachable from the roots, every node after all of its children (deterministic order).</summary>
    public static List<Expr> PostOrder(IEnumerable<Expr> roots)
    {
        var order = new List<Expr>();
        var seen = new HashSet<Expr>();
        var stack = new Stack<(Expr Node, int Next)>();
        foreach (var root in roots)
        {
            if (root is null)
            {
                throw new ArgumentException("An expression is null.", nameof(roots));
            }

            if (!seen.Add(root))
            {
                continue;
            }

            stack.Push((root, 0));
            while (stack.Count > 0)
            {
                var (node, next) = stack.Pop();
                var children = node.Children;
                if (next < children.Length)
                {
                    stack.Push((node, next + 1));
                    var child = children[next];
                    if (seen.Add(child))
                    {
                        stack.Push((child, 0));
                    }
                }
                else
                {
                    order.Add(node);
                }
            }
        }

        return order;
    }

    public static List<Expr> PostOrder(Expr root) => PostOrder([root]);
}
