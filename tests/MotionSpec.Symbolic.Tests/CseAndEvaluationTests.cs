using MotionSpec.Symbolic;

namespace MotionSpec.Symbolic.Tests;

public class CseAndEvaluationTests
{
    private static readonly Symbol X = Symbol.Coord("x");
    private static readonly Symbol Y = Symbol.Coord("y");

    [Fact]
    public void SineAndCosineOfOneAngleAreComputedOnceAcrossOutputs()
    {
        var s = Expr.Sin(X);
        var c = Expr.Cos(X);
        var program = CommonSubexpressions.Eliminate([Y * s + c, Y * c - s, s * c]);
        Assert.Equal(2, program.Temporaries.Count);
        Assert.Equal("k1", program.Temporaries[0].Name.Name);
        Assert.Same(s, program.Temporaries[0].Value);
        Assert.Same(c, program.Temporaries[1].Value);
        Assert.Same(program.Temporaries[0].Name * program.Temporaries[1].Name, program.Outputs[2]);
    }

    [Fact]
    public void TemporaryNamesSkipTakenNames()
    {
        var k1 = Symbol.Param("k1");
        var program = CommonSubexpressions.Eliminate([Expr.Sin(X) + k1], "k", name => name == "k2");
        Assert.Equal("k3", program.Temporaries[0].Name.Name);
        Assert.Equal(SymbolKind.Intermediate, program.Temporaries[0].Name.Kind);
    }

    [Fact]
    public void CompoundBaseOfASmallPowerBecomesATemporaryPrintedAsAProduct()
    {
        var program = CommonSubexpressions.Eliminate([Expr.Pow(X + Y, 2) * X]);
        Assert.Single(program.Temporaries);
        Assert.Same(X + Y, program.Temporaries[0].Value);
        Assert.Equal("k1 * k1 * x", CSharpPrinter.Print(program.Outputs[0], NumericType.Double, s => s.Name)
            .Replace("x * k1 * k1", "k1 * k1 * x", StringComparison.Ordinal));
    }

    [Fact]
    public void OperationCountCountsSharedWorkOnce()
    {
        // sin(x) once, two products, one sum.
        Assert.Equal(4, ExprMetrics.OperationCount([(Y * Expr.Sin(X)) + (X * Expr.Sin(X))]));
        Assert.Equal(1, ExprMetrics.OperationCount([Expr.Pow(X, 2)]));
    }

    [Fact]
    public void NodeCountIsDagAware()
    {
        Expr f = X;
        for (int i = 0; i < 40; i++)
        {
            f = Expr.Sin(f) * Expr.Cos(f);
        }

        Assert.Equal(int.MaxValue, ExprMetrics.TreeNodeCount(f));
        Assert.Equal((40 * 3) + 1, ExprMetrics.NodeCount(f));
        Assert.Equal(ExprMetrics.NodeCount(f), ExprMetrics.NodeCount([f, f]));
    }

    [Fact]
    public void NonFiniteResultsAreReported()
    {
        Assert.False(Evaluator.Evaluate(Expr.One / X, _ => 0.0).IsFinite);
        Assert.False(Evaluator.Evaluate(Expr.Sqrt(X), _ => -1.0).IsFinite);
        Assert.False(Evaluator.Evaluate(Expr.Ln(X), _ => 0.0).IsFinite);
        Assert.True(Evaluator.Evaluate(Expr.Sqrt(X), _ => 4.0).IsFinite);
        Assert.Equal(2.0, Evaluator.Evaluate(Expr.Sqrt(X), _ => 4.0).Value);
    }

    [Fact]
    public void PlanEvaluatesWithoutAllocating()
    {
        var plan = EvaluationPlan.Compile([Expr.Sin(X) * Y, Expr.Pow(X + Y, 3), Expr.Atan2(Y, X)], [X, Y]);
        var inputs = new double[2];
        var outputs = new double[3];
        plan.Evaluate(inputs, outputs);
        long before = GC.GetAllocatedBytesForCurrentThread();
        for (int i = 0; i < 10_000; i++)
        {
            inputs[0] = i * 1e-3;
            inputs[1] = 1.0 - (i * 1e-4);
            plan.Evaluate(inputs, outputs);
        }

        Assert.Equal(0, GC.GetAllocatedBytesForCurrentThread() - before);
        Assert.Equal(Math.Atan2(inputs[1], inputs[0]), outputs[2]);
    }

    [Fact]
    public void PlanRejectsASymbolThatIsNotAnInput()
    {
        Assert.Throws<ArgumentException>(() => EvaluationPlan.Compile([X + Y], [X]));
    }

    [Fact]
    public void SubstitutionIsSimultaneous()
    {
        var map = new Dictionary<Symbol, Expr> { [X] = Y, [Y] = X };
        Assert.Same(Expr.Sin(Y) - X, Substitution.Apply(Expr.Sin(X) - Y, map));
        var angle = new Dictionary<Symbol, Expr> { [X] = 2 * Symbol.Time };
        Assert.Same(Expr.Cos(2 * Symbol.Time), Substitution.Apply(Expr.Cos(-X), angle));
    }
}
