using System.Numerics;
using MotionSpec.Symbolic;

namespace MotionSpec.Symbolic.Tests;

public class RationalTests
{
    [Fact]
    public void ReducesToLowestTermsWithPositiveDenominator()
    {
        var r = new Rational(6, -4);
        Assert.Equal(new BigInteger(-3), r.Numerator);
        Assert.Equal(new BigInteger(2), r.Denominator);
        Assert.Equal("-3/2", r.ToString());
        Assert.Equal("3", new Rational(9, 3).ToString());
        Assert.True(default(Rational).IsZero);
        Assert.Equal(Rational.Zero, new Rational(0, -7));
    }

    [Fact]
    public void ArithmeticAndOrderAreExact()
    {
        Assert.Equal(new Rational(5, 6), new Rational(1, 2) + new Rational(1, 3));
        Assert.Equal(new Rational(1, 6), new Rational(1, 2) - new Rational(1, 3));
        Assert.Equal(new Rational(3, 4), new Rational(1, 2) / new Rational(2, 3));
        Assert.True(new Rational(1, 2) < new Rational(2, 3));
        Assert.Equal(new Rational(-1, 8), new Rational(-1, 2).Pow(3));
        Assert.Throws<DivideByZeroException>(() => Rational.One / Rational.Zero);
    }

    [Theory]
    [InlineData("1.5", 3, 2)]
    [InlineData(".5", 1, 2)]
    [InlineData("2e-3", 1, 500)]
    [InlineData("6.02E+3", 6020, 1)]
    [InlineData("12", 12, 1)]
    public void ParsesDecimalLiteralsExactly(string text, int numerator, int denominator)
    {
        Assert.Equal(new Rational(numerator, denominator), Rational.FromDecimalString(text));
    }

    [Theory]
    [InlineData("1.")]
    [InlineData("")]
    [InlineData("e5")]
    [InlineData("1.5x")]
    public void RejectsMalformedLiterals(string text)
    {
        Assert.False(Rational.TryFromDecimalString(text, out _));
        Assert.Throws<FormatException>(() => Rational.FromDecimalString(text));
    }

    [Fact]
    public void ConvertsToNearestDoubleWithTiesToEven()
    {
        // IEEE 754 round-to-nearest-even (common practice): 2^53 + 1 is a tie between 2^53 and 2^53 + 2.
        var twoTo53 = BigInteger.Pow(2, 53);
        Assert.Equal(9007199254740992.0, Rational.FromInteger(twoTo53 + 1).ToDouble());
        Assert.Equal(9007199254740996.0, Rational.FromInteger(twoTo53 + 3).ToDouble());
        // 0.1 written with huge co-prime terms still lands on the double nearest to 0.1.
        var big = BigInteger.Pow(10, 40);
        Assert.Equal(0.1, new Rational(big + 1, (big * 10) + 10).ToDouble());
        Assert.Equal(1.0 / 3.0, new Rational(1, 3).ToDouble());
        Assert.Equal(double.PositiveInfinity, Rational.FromInteger(BigInteger.Pow(10, 400)).ToDouble());
        Assert.Equal(double.NegativeInfinity, Rational.FromInteger(-BigInteger.Pow(10, 400)).ToDouble());
        Assert.Equal(0.0, new Rational(1, BigInteger.Pow(10, 400)).ToDouble());
        // The smallest subnormal, 2^-1074 (IEEE 754 binary64).
        Assert.Equal(double.Epsilon, new Rational(1, BigInteger.Pow(2, 1074)).ToDouble());
    }
}
