using MotionSpec.Language.Text;

namespace MotionSpec.Language.Syntax;

/// <summary><c>x^2</c>, <c>x^-2</c>, <c>x^(1/2)</c>: a power; the exponent is made of numbers only.</summary>
internal sealed class PowerSyntax(TextSpan span, ExpressionSyntax @base, ExpressionSyntax exponent) : ExpressionSyntax(span)
{
    /// <summary>The base.</summary>
    public ExpressionSyntax Base { get; } = @base;

    /// <summary>The exponent.</summary>
    public ExpressionSyntax Exponent { get; } = exponent;

    /// <inheritdoc/>
    public override string ToString() => Base + "^" + Exponent;
}
