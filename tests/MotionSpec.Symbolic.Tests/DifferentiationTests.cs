using MotionSpec.Symbolic;

namespace MotionSpec.Symbolic.Tests;

public class DifferentiationTests
{
    private static readonly Symbol Q = Symbol.Coord("q");
    private static readonly Symbol X = Symbol.Param("x");
    private static readonly Symbol Y = Symbol.Param("y");

    [Fact]
    public void MarksAdvanceAndTimeAndParamsDifferentiate()
    {
        Assert.Same(Q.WithOrder(1), Differentiation.TimeDerivative(Q).Value);
        Assert.Same(Q.WithOrder(2), Differentiation.TimeDerivative(Q.WithOrder(1)).Value);
        Assert.Same(Expr.One, Differentiation.TimeDerivative(Symbol.Time).Value);
        Assert.Same(Expr.Zero, Differentiation.TimeDerivative(X).Value);
        Assert.Same(Expr.Zero, Differentiation.TimeDerivative(Expr.Sin(Expr.Pi / 7)).Value);
    }

    [Fact]
    public void ThirdDerivativeOfACoordIsAValueNotAnException()
    {
        var result = Differentiation.TimeDerivative(Expr.Sin(Q) * Q.WithOrder(2));
        Assert.False(result.Succeeded);
        Assert.Same(Q.WithOrder(2), result.MissingDerivativeOf);
        Assert.Throws<InvalidOperationException>(() => result.Value);
    }

    [Fact]
    public void IntermediatesNeedTheirDerivativeFromTheCaller()
    {
        var k = Symbol.Intermediate("yaw");
        Assert.Same(k, Differentiation.TimeDerivative(Expr.Cos(k)).MissingDerivativeOf);
        var d = Differentiation.TimeDerivative(Expr.Cos(k), s => ReferenceEquals(s, k) ? Q.WithOrder(1) : null);
        Assert.Same(-(Q.WithOrder(1) * Expr.Sin(k)), d.Value);
    }

    [Fact]
    public void PartialDerivativeTreatsOtherSymbolsAsIndependent()
    {
        var e = (Expr.Pow(X, 2) * Y) + Expr.Sin(X) + Q.WithOrder(1);
        Assert.Same((Expr.Number(2) * X * Y) + Expr.Cos(X), Differentiation.Partial(e, X));
        Assert.Same(Expr.Zero, Differentiation.Partial(Q.WithOrder(1), Q));
        Assert.Same(Expr.One, Differentiation.Partial(Q.WithOrder(1), Q.WithOrder(1)));
    }

    [Fact]
    public void PolarAngleRateFromAtan2SimplifiesToThetaDot()
    {
        // d/dt atan2(r sin(theta), r cos(theta)) = theta' (polar coordinates, common practice).
        var r = Symbol.Coord("r");
        var theta = Symbol.Coord("theta");
        var d = Differentiation.TimeDerivative(Expr.Atan2(r * Expr.Sin(theta), r * Expr.Cos(theta))).Value;
        Assert.Same(theta.WithOrder(1), Simplifier.Simplify(d));
    }

    [Fact]
    public void DerivativeOfNestedChainGrowsLinearly()
    {
        static Expr Chain(int depth)
        {
            Expr f = Q;
            for (int i = 0; i < depth; i++)
            {
                f = (X * Expr.Sin(f)) + Expr.Cos(f);
            }

            return f;
        }

        int n100 = ExprMetrics.NodeCount(Differentiation.TimeDerivative(Chain(100)).Value);
        int n200 = ExprMetrics.NodeCount(Differentiation.TimeDerivative(Chain(200)).Value);
        int n400 = ExprMetrics.NodeCount(Differentiation.TimeDerivative(Chain(400)).Value);
        Assert.InRange(n400 - n200, (n200 - n100) * 2 - 8, (n200 - n100) * 2 + 8);
        Assert.True(ExprMetrics.TreeNodeCount(Chain(100)) == int.MaxValue, "the tree of the chain is exponential; only the DAG is small");
    }
}
