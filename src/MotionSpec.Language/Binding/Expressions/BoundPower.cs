using System.Numerics;
using MotionSpec.Language.Text;

namespace MotionSpec.Language.Binding.Expressions;

/// <summary><c>x^2</c>, <c>x^-2</c>, <c>x^(1/2)</c>: a scalar raised to an exact rational power.</summary>
public sealed class BoundPower(TextSpan span, Dimension dimension, BoundExpr @base, BigInteger numerator, BigInteger denominator)
    : BoundExpr(span, dimension, false)
{
    /// <summary>The base.</summary>
    public BoundExpr Base { get; } = @base;

    /// <summary>Numerator of the exponent, in lowest terms.</summary>
    public BigInteger ExponentNumerator { get; } = numerator;

    /// <summary>Denominator of the exponent, positive, in lowest terms.</summary>
    public BigInteger ExponentDenominator { get; } = denominator;
}
