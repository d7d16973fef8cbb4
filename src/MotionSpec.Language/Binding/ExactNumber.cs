using System.Globalization;
using System.Numerics;

namespace MotionSpec.Language.Binding;

/// <summary>
/// An exact constant (Numerator / Denominator) * pi^PiPower, so that decimal literals and units such as
/// <c>deg</c>, <c>rpm</c> and <c>in</c> keep their defined values without rounding. Denominator is positive.
/// </summary>
public readonly record struct ExactNumber(BigInteger Numerator, BigInteger Denominator, int PiPower)
{
    /// <summary>Exact one.</summary>
    public static ExactNumber One => new(BigInteger.One, BigInteger.One, 0);

    /// <summary>Exact zero.</summary>
    public static ExactNumber Zero => new(BigInteger.Zero, BigInteger.One, 0);

    /// <summary>True when the value is zero.</summary>
    public bool IsZero => Numerator.IsZero;

    /// <summary>The nearest double to the rational part (correctly rounded), times pi^PiPower; infinite beyond the range of doubles.</summary>
    public double ToDouble()
    {
        if (Numerator.IsZero)
        {
            return 0;
        }

        var ratio = RationalToDouble(Numerator, Denominator);
        return PiPower switch
        {
            0 => ratio,
            1 => ratio * Math.PI,
            _ => ratio * Math.Pow(Math.PI, PiPower),
        };
    }

    /// <summary>The product of two exact numbers, in lowest terms.</summary>
    internal static ExactNumber Multiply(ExactNumber a, ExactNumber b) =>
        Reduced(a.Numerator * b.Numerator, a.Denominator * b.Denominator, a.PiPower + b.PiPower);

    /// <summary>The quotient of two exact numbers; <paramref name="b"/> must not be zero.</summary>
    internal static ExactNumber Divide(ExactNumber a, ExactNumber b) =>
        Reduced(a.Numerator * b.Denominator, a.Denominator * b.Numerator, a.PiPower - b.PiPower);

    /// <summary>The value with its sign changed.</summary>
    internal ExactNumber Negate() => new(-Numerator, Denominator, PiPower);

    /// <summary>An integer power; a negative power of zero is the caller's error to catch first.</summary>
    internal ExactNumber Pow(int exponent)
    {
        var magnitude = Math.Abs(exponent);
        var num = BigInteger.Pow(Numerator, magnitude);
        var den = BigInteger.Pow(Denominator, magnitude);
        return exponent >= 0 ? Reduced(num, den, PiPower * exponent) : Reduced(den, num, PiPower * exponent);
    }

    /// <summary>Lowest terms with a positive denominator.</summary>
    internal static ExactNumber Reduced(BigInteger numerator, BigInteger denominator, int piPower)
    {
        if (denominator.Sign < 0)
        {
            numerator = -numerator;
            denominator = -denominator;
        }

        if (numerator.IsZero)
        {
            return new ExactNumber(BigInteger.Zero, BigInteger.One, 0);
        }

        var gcd = BigInteger.GreatestCommonDivisor(numerator, denominator);
        return new ExactNumber(numerator / gcd, denominator / gcd, piPower);
    }

    /// <summary>
    /// Reads a decimal literal (<c>12</c>, <c>1.5</c>, <c>.5</c>, <c>2e-3</c>) exactly. Decimal exponents beyond
    /// +/-<paramref name="maxExponent"/> give null for overflow (the caller reports a non-finite constant) or
    /// zero for underflow; both are far outside the range of doubles.
    /// </summary>
    internal static ExactNumber? ParseDecimal(string text, int maxExponent = 1000)
    {
        var mantissa = text;
        var exponent = 0L;
        var e = text.IndexOfAny(['e', 'E']);
        if (e >= 0)
        {
            mantissa = text.Substring(0, e);
            var expText = text.Substring(e + 1);
            var negative = expText.Length > 0 && expText[0] == '-';
            var digits = expText.TrimStart('+', '-').TrimStart('0');
            if (digits.Length > 9)
            {
                return negative ? Zero : null;
            }

            exponent = digits.Length == 0 ? 0 : long.Parse(digits, CultureInfo.InvariantCulture);
            if (negative)
            {
                exponent = -exponent;
            }
        }

        var point = mantissa.IndexOf('.');
        var integerPart = point >= 0 ? mantissa.Substring(0, point) : mantissa;
        var fraction = point >= 0 ? mantissa.Substring(point + 1) : string.Empty;
        var allDigits = (integerPart + fraction).TrimStart('0');
        exponent -= fraction.Length;
        if (allDigits.Length == 0)
        {
            return Zero;
        }

        if (exponent + allDigits.Length > maxExponent)
        {
            return null;
        }

        if (exponent + allDigits.Length < -maxExponent)
        {
            return Zero;
        }

        var value = BigInteger.Parse(allDigits, NumberStyles.None, CultureInfo.InvariantCulture);
        return exponent >= 0
            ? Reduced(value * BigInteger.Pow(10, (int)exponent), BigInteger.One, 0)
            : Reduced(value, BigInteger.Pow(10, (int)-exponent), 0);
    }

    /// <inheritdoc/>
    public override string ToString()
    {
        var rational = Denominator.IsOne
            ? Numerator.ToString(CultureInfo.InvariantCulture)
            : Numerator.ToString(CultureInfo.InvariantCulture) + "/" + Denominator.ToString(CultureInfo.InvariantCulture);
        return PiPower switch
        {
            0 => rational,
            1 => rational + "*pi",
            _ => rational + "*pi^" + PiPower.ToString(CultureInfo.InvariantCulture),
        };
    }

    // Correct rounding: take a quotient with at least 64 significant bits plus a sticky bit for the remainder,
    // so the single rounding of the ulong-to-double conversion is the rounding of the exact value.
    private static double RationalToDouble(BigInteger numerator, BigInteger denominator)
    {
        var negative = numerator.Sign < 0;
        var n = BigInteger.Abs(numerator);
        var shift = 64 - (BitLength(n) - BitLength(denominator));
        BigInteger quotient, remainder;
        if (shift >= 0)
        {
            quotient = BigInteger.DivRem(n << shift, denominator, out remainder);
        }
        else
        {
            quotient = BigInteger.DivRem(n, denominator << -shift, out remainder);
        }

        // quotient now has 64 or 65 bits; drop to 62 bits keeping a sticky bit so it fits a long.
        var drop = BitLength(quotient) - 62;
        var sticky = !remainder.IsZero;
        if (drop > 0)
        {
            sticky |= !(quotient & ((BigInteger.One << drop) - 1)).IsZero;
            quotient >>= drop;
            shift -= drop;
        }

        var bits = (long)quotient;
        if (sticky)
        {
            bits |= 1;
        }

        var result = ScaleByPowerOfTwo(bits, -shift);
        return negative ? -result : result;
    }

    private static double ScaleByPowerOfTwo(long mantissa, int exponent)
    {
        // The mantissa has at most 62 bits, so converting it rounds once; scaling by powers of two is exact
        // unless the result is subnormal, where a second rounding may occur (values below 2.2e-308).
        double value = mantissa;
        while (exponent > 1000)
        {
            value *= Math.Pow(2, 1000);
            exponent -= 1000;
            if (double.IsInfinity(value))
            {
                return value;
            }
        }

        while (exponent < -1000)
        {
            value *= Math.Pow(2, -1000);
            exponent += 1000;
        }

        return value * Math.Pow(2, exponent);
    }

    private static int BitLength(BigInteger value)
    {
        if (value.IsZero)
        {
            return 0;
        }

        var bytes = BigInteger.Abs(value).ToByteArray();
        var top = bytes[bytes.Length - 1];
        var length = (bytes.Length - 1) * 8;
        while (top != 0)
        {
            length++;
            top >>= 1;
        }

        return length;
    }
}
