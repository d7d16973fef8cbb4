using System.Numerics;

namespace MotionSpec.Symbolic;

/// <summary>
/// The content of a sum: the rational number that, taken out, leaves integer coefficients with no common
/// divisor and a positive leading term (the first term that is not a constant). A sum that is a factor of a
/// product, or the base of an integer power, is always held by its primitive part with the content moved
/// into the product's coefficient; otherwise one value has many shapes: -c*(a + b) against c*(-a - b),
/// 2*c*(a + b) against c*(2*a + 2*b).
/// </summary>
internal static class SumContent
{
    /// <summary>The content (1 for a sum already primitive) and the primitive part.</summary>
    public static (Rational Content, Sum Primitive) Of(Sum s)
    {
        var cached = s.CachedContent;
        if (cached is not null)
        {
            return (cached.Content, cached.Primitive);
        }

        var numerators = BigInteger.Zero;
        var denominators = BigInteger.One;
        int sign = 0;
        foreach (var term in s.Children)
        {
            var c = term switch
            {
                Number n => n.Value,
                Product p => p.Coefficient,
                _ => Rational.One,
            };
            if (sign == 0 && term is not Number)
            {
                sign = c.Sign;
            }

            numerators = BigInteger.GreatestCommonDivisor(numerators, c.Numerator);
            denominators = denominators / BigInteger.GreatestCommonDivisor(denominators, c.Denominator) * c.Denominator;
        }

        var content = new Rational(sign < 0 ? -numerators : numerators, denominators);
        var primitive = s;
        if (!content.IsOne)
        {
            primitive = ProductBuilder.Distribute(s, Rational.One / content);
            primitive.CachedContent ??= new Split(Rational.One, primitive);
        }

        // A reference is written atomically, so threads sharing interned nodes never see half a cache entry.
        s.CachedContent = new Split(content, primitive);
        return (content, primitive);
    }

    /// <summary>A cached result of <see cref="Of"/>.</summary>
    internal sealed class Split(Rational content, Sum primitive)
    {
        public Rational Content { get; } = content;

        public Sum Primitive { get; } = primitive;
    }

    /// <summary>The sign rule for sums used everywhere a sum's sign matters: the sign of its leading non-constant term.</summary>
    public static bool LeadsNegative(Sum s)
    {
        foreach (var term in s.Children)
        {
            switch (term)
            {
                case Number:
                    continue;
                case Product p:
                    return p.Coefficient.Sign < 0;
                default:
                    return false;
            }
        }

        return false;
    }
}
