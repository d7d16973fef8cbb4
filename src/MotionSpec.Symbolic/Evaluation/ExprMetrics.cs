namespace MotionSpec.Symbolic;

/// <summary>Size measures that tests and benchmarks can hold.</summary>
public static class ExprMetrics
{
    /// <summary>Distinct nodes in the DAG (a shared subexpression counts once).</summary>
    public static int NodeCount(Expr e) => DagWalk.PostOrder(e).Count;

    /// <summary>Distinct nodes over several roots, shared across them.</summary>
    public static int NodeCount(IEnumerable<Expr> roots) => DagWalk.PostOrder(roots).Count;

    /// <summary>Nodes as printed without sharing (saturates at int.MaxValue).</summary>
    public static int TreeNodeCount(Expr e) => e is null ? throw new ArgumentNullException(nameof(e)) : e.TreeSize;

    /// <summary>
    /// Arithmetic operations and calls needed to evaluate all roots after common subexpression elimination:
    /// n-1 for an n-ary sum or product, the multiplications and division of a small integer power, one for
    /// any other power or function call.
    /// </summary>
    public static int OperationCount(IEnumerable<Expr> roots)
    {
        if (roots is null)
        {
            throw new ArgumentNullException(nameof(roots));
        }

        var program = CommonSubexpressions.Eliminate([.. roots], "op");
        var all = new List<Expr>();
        foreach (var t in program.Temporaries)
        {
            all.Add(t.Value);
        }

        all.AddRange(program.Outputs);
        long total = 0;
        var counted = new HashSet<Expr>();
        foreach (var node in DagWalk.PostOrder(all))
        {
            if (counted.Add(node))
            {
                total += OperationsOf(node);
            }
        }

        return (int)Math.Min(total, int.MaxValue);
    }

    internal static int OperationsOf(Expr node) => node switch
    {
        Sum s => s.Children.Length - 1,
        Product p => p.Children.Length - 1,
        Power pw => PowerOperations(pw.Exponent),
        Call => 1,
        _ => 0,
    };

    private static int PowerOperations(Rational e)
    {
        if (e.TryGetInt32(out int n) && n is >= -4 and <= 4)
        {
            int multiplies = n switch { 2 or -2 => 1, 3 or -3 => 2, 4 or -4 => 3, _ => 0 };
            return multiplies + (n < 0 ? 1 : 0);
        }

        return 1;
    }
}
