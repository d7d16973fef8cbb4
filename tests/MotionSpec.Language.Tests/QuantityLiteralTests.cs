using MotionSpec.Language.Binding;

namespace MotionSpec.Language.Tests;

public class QuantityLiteralTests
{
    [Theory]
    [InlineData("10 deg/s", 10 * Math.PI / 180, 0, -1, true)]
    [InlineData("-2e-05", -2e-05, 0, 0, false)]
    [InlineData("+.5 m", 0.5, 1, 0, true)]
    [InlineData("100ms", 0.1, 0, 1, true)]
    [InlineData("6.5", 6.5, 0, 0, false)]
    [InlineData("2 s", 2, 0, 1, true)]
    [InlineData("-3 m/s^2", -3, 1, -2, true)]
    public void Reads_quantities_like_the_language(string text, double value, int length, int time, bool hasUnit)
    {
        Assert.True(QuantityLiteral.TryParse(text, out var si, out var dimension, out var unit, out var error), error);
        Assert.Equal(value, si, 15);
        Assert.Equal(hasUnit, unit);
        Assert.Equal(hasUnit ? Dimension.Of(length, time) : Dimension.Free, dimension);
        Assert.Null(error);
    }

    [Theory]
    [InlineData("1.")]
    [InlineData("")]
    [InlineData("m")]
    [InlineData("2 furlong")]
    [InlineData("2 m m")]
    [InlineData("1e999")]
    [InlineData("--1")]
    [InlineData("2 m / s")]
    public void Rejects_what_the_language_rejects(string text)
    {
        Assert.False(QuantityLiteral.TryParse(text, out _, out _, out _, out var error));
        Assert.False(string.IsNullOrEmpty(error));
    }
}
