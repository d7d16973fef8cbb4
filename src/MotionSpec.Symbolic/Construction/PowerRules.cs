using System.Numerics;

namespace MotionSpec.Symbolic;

/// <summary>
/// Canonical powers: x^0 = 1, x^1 = x, exact numeric powers and roots, integer powers distributed over
/// products and taken through the content of a sum ((2*a + 2*b)^2 = 4*(a + b)^2), and (x^a)^b = x^(a*b)
/// only where that identity holds for every real x where the left side is defined (b an integer, or a not
/// an integer). So sqrt(x)^2 = x but sqrt(x^2) stays as it is.
/// </summary>
internal static class PowerRules
{
    // Beyond this many result bits a numeric power is kept symbolic rather than computed.
    private const long MaxExactBits = 1 << 16;

    public static Expr Pow(Expr b, Rational e)
    {
        if (b is null)
        {
            throw new ArgumentNullException(nameof(b));
        }

        if (e.IsZero)
        {
            return Nodes.One;
        }

        if (e.IsOne)
        {
            return b;
        }

        switch (b)
        {
            case Number n:
                return NumericPower(n, e);
            case Power p when e.IsInteger || !p.Exponent.IsInteger:
                return Pow(p.Base, p.Exponent * e);
            case Sum s when e.IsInteger:
                {
                    // (k*P)^n = k^n * P^n with P the primitive part, so the number sits outside the power.
                    var (content, primitive) = SumContent.Of(s);
                    return content.IsOne
                        ? Power.CreateRaw(s, e)
                        : ProductBuilder.Build([NumericPower(Number.Create(content), e), Power.CreateRaw(primitive, e)]);
                }

            case Product p when e.IsInteger:
                {
                    var factors = new Expr[p.Children.Length];
                    for (int i = 0; i < factors.Length; i++)
                    {
                        factors[i] = Pow(p.Children[i], e);
                    }

                    return ProductBuilder.Build(factors);
                }

            default:
                return Power.CreateRaw(b, e);
        }
    }

    private static Expr NumericPower(Number n, Rational e)
    {
        var v = n.Value;
        if (v.IsZero)
        {
            // 0^positive is 0; 0^negative is a division by zero, kept so evaluation reports it.
            return e.Sign > 0 ? Nodes.Zero : Power.CreateRaw(n, e);
        }

        if (v.IsOne)
        {
            return Nodes.One;
        }

        if (!e.TryGetInt32(out int _) && e.IsInteger)
        {
            return Power.CreateRaw(n, e);
        }

        if (e.IsInteger)
        {
            int k = (int)e.Numerator;
            long bits = (RationalToDouble.BitLength(BigInteger.Abs(v.Numerator)) + RationalToDouble.BitLength(v.Denominator)) * (long)Math.Abs(k);
            return bits > MaxExactBits ? Power.CreateRaw(n, e) : Number.Create(v.Pow(k));
        }

        // Fractional exponent p/q: exact when numerator and denominator are perfect q-th powers.
        if (v.Sign > 0 && e.Denominator <= 64 && BigInteger.Abs(e.Numerator) <= 64)
        {
            int q = (int)e.Denominator;
            int p = (int)e.Numerator;
            if (TryRoot(v.Numerator, q, out var rn) && TryRoot(v.Denominator, q, out var rd))
            {
                return Number.Create(new Rational(rn, rd).Pow(p));
            }
        }

        return Power.CreateRaw(n, e);
    }

    private static bool TryRoot(BigInteger value, int degree, out BigInteger root)
    {
        root = BigInteger.Zero;
        if (value.Sign < 0)
        {
            return false;
        }

        if (value.IsZero || value.IsOne)
        {
            root = value;
            return true;
        }

        // Newton's iteration from above on the integer root.
        long bits = RationalToDouble.BitLength(value);
        var x = BigInteger.One << (int)((bits / degree) + 1);
        while (true)
        {
            var y = ((degree - 1) * x + value / BigInteger.Pow(x, degree - 1)) / degree;
            if (y >= x)
            {
                break;
            }

            x = y;
        }

        root = x;
        return BigInteger.Pow(x, degree) == value;
    }
}
