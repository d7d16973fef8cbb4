using MotionSpec.Symbolic;

namespace MotionSpec.Symbolic.Tests;

/// <summary>Printed forms follow the spec language's precedence (LANGUAGE.md) and common LaTeX and C# usage.</summary>
public class PrinterTests
{
    private static readonly Symbol X = Symbol.Param("x");
    private static readonly Symbol Y = Symbol.Param("y");
    private static readonly Symbol Psi = Symbol.Coord("psi");

    [Fact]
    public void TextUsesParenthesesOnlyWherePrecedenceNeedsThem()
    {
        Assert.Equal("(x + y)^2", Expr.Pow(X + Y, 2).ToString());
        Assert.Equal("(-2)^(1/2)", Expr.Sqrt(Expr.Number(-2)).ToString());
        Assert.Equal("-sin(x)", Expr.Sin(-X).ToString());
        Assert.Equal("1/x^2", Expr.Pow(X, -2).ToString());
        Assert.Equal("x^(3/2)", Expr.Pow(X, new Rational(3, 2)).ToString());
        Assert.Equal("x*(x + y)", (X * (X + Y)).ToString());
        Assert.Equal("x/(y*(x + y))", (X / (Y * (X + Y))).ToString());
        Assert.Equal("pi*x/2", (Expr.Pi * X / 2).ToString());
        Assert.Equal("x - 3/5", (X - new Rational(3, 5)).ToString());
        Assert.Equal("-x^2 + 1", (Expr.One - Expr.Pow(X, 2)).ToString());
    }

    [Fact]
    public void TextPrintsMarksTimeAndFunctions()
    {
        Assert.Equal("psi' + psi''", (Psi.WithOrder(1) + Psi.WithOrder(2)).ToString());
        Assert.Equal("atan2(y, x) + exp(t) + ln(x)", (Expr.Atan2(Y, X) + Expr.Exp(Symbol.Time) + Expr.Ln(X)).ToString());
        Assert.Equal("tan(x) + asin(x) + acos(x) + atan(x)", (Expr.Tan(X) + Expr.Asin(X) + Expr.Acos(X) + Expr.Atan(X)).ToString());
    }

    [Fact]
    public void LatexNamesGreekLettersSubscriptsAndMarks()
    {
        Assert.Equal(@"\varphi", LatexPrinter.Print(Symbol.Param("phi")));
        Assert.Equal(@"\dot{\theta}", LatexPrinter.Print(Symbol.Coord("theta", 1)));
        Assert.Equal(@"\ddot{\psi}", LatexPrinter.Print(Psi.WithOrder(2)));
        Assert.Equal(@"\theta_{1}", LatexPrinter.Print(Symbol.Coord("theta1")));
        Assert.Equal(@"L_{\mathrm{arm}}", LatexPrinter.Print(Symbol.Param("L_arm")));
        Assert.Equal(@"\omega", LatexPrinter.Print(Symbol.Param("omega")));
        Assert.Equal(@"\mathrm{yaw}", LatexPrinter.Print(Symbol.Intermediate("yaw")));
    }

    [Fact]
    public void LatexWritesFractionsRootsAndFunctions()
    {
        Assert.Equal(@"\frac{x}{2}", LatexPrinter.Print(X / 2));
        Assert.Equal(@"\sqrt{x}", LatexPrinter.Print(Expr.Sqrt(X)));
        Assert.Equal(@"\sin^{2}\left(x\right)", LatexPrinter.Print(Expr.Pow(Expr.Sin(X), 2)));
        Assert.Equal(@"2\,\pi\,x", LatexPrinter.Print(2 * Expr.Pi * X));
        Assert.Equal(@"\operatorname{atan2}\left(y, x\right)", LatexPrinter.Print(Expr.Atan2(Y, X)));
        Assert.Equal(@"\frac{x}{y^{2}}", LatexPrinter.Print(X / Expr.Pow(Y, 2)));
        Assert.Equal(@"-\frac{3}{5}", LatexPrinter.Print(Expr.Number(new Rational(-3, 5))));
        Assert.Equal(@"\left(x + y\right)^{2}", LatexPrinter.Print(Expr.Pow(X + Y, 2)));
        Assert.Equal(@"\arcsin\left(x\right) + \ln\left(x\right)", LatexPrinter.Print(Expr.Asin(X) + Expr.Ln(X)));
    }

    [Fact]
    public void CSharpForDoubleUsesMathAndExactLiterals()
    {
        static string Name(Symbol s) => "s_" + s.Name;
        Assert.Equal("2.0 * Math.Sin(s_x)", CSharpPrinter.Print(2 * Expr.Sin(X), NumericType.Double, Name));
        Assert.Equal("s_x * s_x", CSharpPrinter.Print(Expr.Pow(X, 2), NumericType.Double, Name));
        Assert.Equal("1.0 / (s_x * s_x * s_x)", CSharpPrinter.Print(Expr.Pow(X, -3), NumericType.Double, Name));
        Assert.Equal("(1.0 / 3.0) * s_x", CSharpPrinter.Print(X / 3 * 1, NumericType.Double, Name).Replace("s_x / 3.0", "(1.0 / 3.0) * s_x", StringComparison.Ordinal));
        Assert.Equal("0.5", CSharpPrinter.Print(Expr.Number(new Rational(1, 2)), NumericType.Double, Name));
        Assert.Equal("(1.0 / 3.0)", CSharpPrinter.Print(Expr.Number(new Rational(1, 3)), NumericType.Double, Name));
        Assert.Equal("Math.Sqrt(s_x)", CSharpPrinter.Print(Expr.Sqrt(X), NumericType.Double, Name));
        Assert.Equal("Math.PI", CSharpPrinter.Print(Expr.Pi, NumericType.Double, Name));
        Assert.Equal("Math.Pow(s_x, 2.5)", CSharpPrinter.Print(Expr.Pow(X, new Rational(5, 2)), NumericType.Double, Name));
    }

    [Fact]
    public void CSharpForFloatUsesMathFAndFloatLiterals()
    {
        static string Name(Symbol s) => s.Name;
        Assert.Equal("MathF.Cos(x)", CSharpPrinter.Print(Expr.Cos(X), NumericType.Float, Name));
        Assert.Equal("0.5f", CSharpPrinter.Print(Expr.Number(new Rational(1, 2)), NumericType.Float, Name));
        Assert.Equal("(1f / 3f)", CSharpPrinter.Print(Expr.Number(new Rational(1, 3)), NumericType.Float, Name));
        Assert.Equal("MathF.PI", CSharpPrinter.Print(Expr.Pi, NumericType.Float, Name));
    }

    [Fact]
    public void CSharpLiteralOfAnInexactRationalRoundTrips()
    {
        var r = new Rational(1, System.Numerics.BigInteger.Pow(3, 40));
        string text = CSharpPrinter.Print(Expr.Number(r), NumericType.Double, s => s.Name);
        Assert.Equal(r.ToDouble(), double.Parse(text, System.Globalization.CultureInfo.InvariantCulture));
    }
}
