using MotionSpec.Symbolic;

namespace MotionSpec.Symbolic.Tests;

public class CanonicalFormTests
{
    private static readonly Symbol X = Symbol.Param("x");
    private static readonly Symbol Y = Symbol.Param("y");
    private static readonly Symbol Theta = Symbol.Coord("theta");

    [Fact]
    public void SumsAreOrderIndependentAndCombineLikeTerms()
    {
        Assert.Same(X + Y, Y + X);
        Assert.Same(Expr.Number(3) * X, X + X + X);
        Assert.Same(Expr.Zero, X - X);
        Assert.Same(Expr.Zero, (X + Y) - (Y + X));
        Assert.Equal("x + y", (Y + X).ToString());
    }

    [Fact]
    public void ProductsFoldNumbersAndCombineLikeFactors()
    {
        Assert.Same(Expr.Pow(X, 2), X * X);
        Assert.Same(Expr.One, X / X);
        Assert.Same(Expr.Zero, Expr.Zero * X);
        Assert.Same(X, Expr.One * X);
        Assert.Same(Expr.One, Expr.Pow(X, 0));
        Assert.Equal("6*x*y", (Expr.Number(2) * Y * Expr.Number(3) * X).ToString());
    }

    [Fact]
    public void FunctionSymmetryAndExactValues()
    {
        Assert.Same(-Expr.Sin(X), Expr.Sin(-X));
        Assert.Same(Expr.Cos(X), Expr.Cos(-X));
        Assert.Same(Expr.Zero, Expr.Sin(Expr.Zero));
        Assert.Same(Expr.One, Expr.Cos(Expr.Zero));
        Assert.Same(Expr.Zero, Expr.Sin(Expr.Pi));
        Assert.Same(Expr.Number(-1), Expr.Cos(Expr.Pi));
        // sin(30 deg) = 1/2 (common practice).
        Assert.Same(Expr.Number(new Rational(1, 2)), Expr.Sin(Expr.Pi / 6));
    }

    [Fact]
    public void SquareRootRulesOnlyWhereValid()
    {
        Assert.Same(X, Expr.Pow(Expr.Sqrt(X), 2));
        Assert.NotSame(X, Expr.Sqrt(Expr.Pow(X, 2)));
        Assert.Same(Expr.Number(3), Expr.Sqrt(Expr.Number(9)));
    }

    [Fact]
    public void PrintsSpecSyntax()
    {
        var r = Symbol.Coord("r");
        var e = Symbol.Coord("r", 2) - r * Expr.Pow(Symbol.Coord("theta", 1), 2);
        Assert.Equal("r'' - r*theta'^2", e.ToString());
        Assert.Equal("-x^2", (-Expr.Pow(X, 2)).ToString());
        Assert.Equal("x/y^2", (X / Expr.Pow(Y, 2)).ToString());
        Assert.Equal("sin(theta)^2", Expr.Pow(Expr.Sin(Theta), 2).ToString());
        Assert.Equal("x^(1/2)", Expr.Sqrt(X).ToString());
        Assert.Equal("3*x/5", (Expr.Number(new Rational(3, 5)) * X).ToString());
    }
}
