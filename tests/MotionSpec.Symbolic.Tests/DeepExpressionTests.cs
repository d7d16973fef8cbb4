using MotionSpec.Symbolic;

namespace MotionSpec.Symbolic.Tests;

/// <summary>Every pass over expressions thousands of levels deep runs on a small stack: nothing recurses on depth.</summary>
public class DeepExpressionTests
{
    private const int Depth = 6000;

    private static Expr Deep()
    {
        var q = Symbol.Coord("q");
        Expr f = q;
        for (int i = 0; i < Depth; i++)
        {
            f = Expr.Sin(f) + (i % 2 == 0 ? q : Symbol.Param("L"));
        }

        return f;
    }

    private static void OnSmallStack(Action action)
    {
        Exception? failure = null;
        var thread = new Thread(() =>
        {
            try
            {
                action();
            }
            catch (Exception e)
            {
                failure = e;
            }
        }, 256 * 1024);
        thread.Start();
        thread.Join();
        Assert.Null(failure);
    }

    [Fact]
    public void EqualityHashAndOrderOnDeepExpressions()
    {
        OnSmallStack(() =>
        {
            var a = Deep();
            var b = Deep();
            Assert.Same(a, b);
            Assert.Equal(a.GetHashCode(), b.GetHashCode());
            Assert.Equal(0, a.CompareTo(b));
            Assert.True(Deep() + Symbol.Param("z") != a);
        });
    }

    [Fact]
    public void PrintersOnDeepExpressions()
    {
        OnSmallStack(() =>
        {
            var e = Deep();
            Assert.StartsWith("L + sin(", TextPrinter.Print(e), StringComparison.Ordinal);
            Assert.Contains(@"\sin\left(", LatexPrinter.Print(e), StringComparison.Ordinal);
            Assert.Contains("Math.Sin(", CSharpPrinter.Print(e, NumericType.Double, s => s.Name), StringComparison.Ordinal);
        });
    }

    [Fact]
    public void CalculusEvaluationAndCseOnDeepExpressions()
    {
        OnSmallStack(() =>
        {
            var e = Deep();
            var d = Differentiation.TimeDerivative(e).Value;
            Assert.True(ExprMetrics.NodeCount(d) < 10 * Depth);
            Assert.True(Evaluator.Evaluate(d, _ => 0.3).IsFinite);
            var simplified = Simplifier.Simplify(e);
            Assert.Same(e, simplified);
            var program = CommonSubexpressions.Eliminate([e, d]);
            Assert.NotEmpty(program.Temporaries);
            var plan = EvaluationPlan.Compile([d], [Symbol.Coord("q"), Symbol.Coord("q", 1), Symbol.Param("L")]);
            var output = new double[1];
            plan.Evaluate([0.3, 0.3, 0.3], output);
            Assert.Equal(Evaluator.Evaluate(d, _ => 0.3).Value, output[0]);
            Assert.Same(e, Substitution.Apply(e, new Dictionary<Symbol, Expr> { [Symbol.Param("unused")] = Expr.One }));
        });
    }
}
