namespace MotionSpec.Symbolic;

/// <summary>Numeric evaluation in double, each shared node computed once.</summary>
public static class Evaluator
{
    /// <summary>Evaluates e with symbol values from valueOf (pi and numbers are built in).</summary>
    public static EvaluationResult Evaluate(Expr e, Func<Symbol, double> valueOf)
    {
        if (valueOf is null)
        {
            throw new ArgumentNullException(nameof(valueOf));
        }

        var values = new Dictionary<Expr, double>();
        foreach (var node in DagWalk.PostOrder(e))
        {
            values[node] = Node(node, values, valueOf);
        }

        return new EvaluationResult(values[e]);
    }

    private static double Node(Expr node, Dictionary<Expr, double> values, Func<Symbol, double> valueOf)
    {
        switch (node)
        {
            case Number n:
                return n.Value.ToDouble();
            case PiConstant:
                return Math.PI;
            case Symbol s:
                return valueOf(s);
            case Sum sum:
                {
                    double acc = values[sum.Children[0]];
                    for (int i = 1; i < sum.Children.Length; i++)
                    {
                        acc += values[sum.Children[i]];
                    }

                    return acc;
                }

            case Product p:
                {
                    double acc = values[p.Children[0]];
                    for (int i = 1; i < p.Children.Length; i++)
                    {
                        acc *= values[p.Children[i]];
                    }

                    return acc;
                }

            case Power pw:
                return DoubleSemantics.Pow(values[pw.Base], pw.Exponent);
            case Call { Function: Function.Atan2 } c:
                return Math.Atan2(values[c.Children[0]], values[c.Children[1]]);
            case Call c:
                return DoubleSemantics.Apply(c.Function, values[c.Children[0]]);
            default:
                return double.NaN;
        }
    }
}
