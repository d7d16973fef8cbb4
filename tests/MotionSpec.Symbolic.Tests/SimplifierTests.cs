using MotionSpec.Symbolic;

namespace MotionSpec.Symbolic.Tests;

/// <summary>The Pythagorean identity sin^2 + cos^2 = 1 (common practice) in the forms kinematics produces.</summary>
public class SimplifierTests
{
    private static readonly Symbol A = Symbol.Param("a");
    private static readonly Symbol B = Symbol.Param("b");
    private static readonly Symbol R = Symbol.Param("r");
    private static readonly Symbol X = Symbol.Coord("x");
    private static readonly Symbol ThetaDot = Symbol.Coord("theta", 1);

    private static Expr Sin2(Expr u) => Expr.Pow(Expr.Sin(u), 2);

    private static Expr Cos2(Expr u) => Expr.Pow(Expr.Cos(u), 2);

    [Fact]
    public void ScaledPythagoreanInsideALargerSum()
    {
        Assert.Same(A + B, Simplifier.Simplify((A * Sin2(X)) + (A * Cos2(X)) + B));
    }

    [Fact]
    public void PythagoreanWithProductCoefficients()
    {
        var k = R * Expr.Pow(ThetaDot, 2);
        Assert.Same(k, Simplifier.Simplify((k * Cos2(X)) + (k * Sin2(X))));
    }

    [Fact]
    public void OneMinusSineSquaredIsCosineSquared()
    {
        Assert.Same(Expr.Number(3) * Cos2(X), Simplifier.Simplify(Expr.Number(3) - (Expr.Number(3) * Sin2(X))));
    }

    [Fact]
    public void UnequalScalesLeaveTheDifference()
    {
        // 3 sin^2 + 2 cos^2 + b = sin^2 + 2 + b
        var e = (Expr.Number(3) * Sin2(X)) + (Expr.Number(2) * Cos2(X)) + Expr.Number(2);
        Assert.Same(Sin2(X) + Expr.Number(4), Simplifier.Simplify(e));
    }

    [Fact]
    public void TakesOutACommonFactorWhenThatShrinks()
    {
        var e = (A * X) + (A * Expr.Sin(X)) + (A * B);
        var s = Simplifier.Simplify(e);
        Assert.Same(A * (X + Expr.Sin(X) + B), s);
        Assert.True(ExprMetrics.NodeCount(s) < ExprMetrics.NodeCount(e));
    }

    [Fact]
    public void DoesNotExpandWhenThatGrows()
    {
        var e = (A + B) * (X + R);
        Assert.Same(e, Simplifier.Simplify(e));
    }

    [Fact]
    public void ExpandsWhenTermsCancel()
    {
        var e = ((A + B) * X) - (A * X);
        Assert.Same(B * X, Simplifier.Simplify(e));
    }

    [Fact]
    public void SquareRootOfASquareIsNotTheBase()
    {
        var e = Expr.Sqrt(Expr.Pow(X, 2));
        Assert.NotSame(X, Simplifier.Simplify(e));
        Assert.Equal(2.0, Evaluator.Evaluate(Simplifier.Simplify(e), _ => -2.0).Value);
    }
}
