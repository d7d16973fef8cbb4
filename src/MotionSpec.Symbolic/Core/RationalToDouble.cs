using System.Numerics;

namespace MotionSpec.Symbolic;

/// <summary>Correctly rounded conversion of a BigInteger ratio to double (round half to even).</summary>
internal static class RationalToDouble
{
    private static readonly BigInteger TwoTo53 = BigInteger.One << 53;

    public static double Convert(BigInteger numerator, BigInteger denominator)
    {
        if (numerator.IsZero)
        {
            return 0.0;
        }

        bool negative = numerator.Sign < 0;
        var a = BigInteger.Abs(numerator);
        if (a < TwoTo53 && denominator < TwoTo53)
        {
            // Both operands are exact doubles, so IEEE division rounds correctly.
            double quick = (double)a / (double)denominator;
            return negative ? -quick : quick;
        }

        long la = BitLength(a);
        long lb = BitLength(denominator);
        long shift = 65 - (la - lb);
        var q = shift >= 0
            ? BigInteger.DivRem(a << (int)shift, denominator, out var rem)
            : BigInteger.DivRem(a, denominator << (int)-shift, out rem);
        bool sticky = !rem.IsZero;
        long bits = BitLength(q);

        // Value = q * 2^-shift; leading bit has weight 2^exponent.
        long exponent = bits - 1 - shift;
        if (exponent > 1023)
        {
            return negative ? double.NegativeInfinity : double.PositiveInfinity;
        }

        long precision = exponent >= -1022 ? 53 : 53 - (-1022 - exponent);
        if (precision <= 0)
        {
            // Below the smallest subnormal: round to it only when strictly above half of it.
            bool aboveHalf = precision == 0 && (sticky || q != (BigInteger.One << (int)(bits - 1)));
            double tiny = aboveHalf ? double.Epsilon : 0.0;
            return negative ? -tiny : tiny;
        }

        long drop = bits - precision;
        var mantissa = q >> (int)drop;
        var dropped = q - (mantissa << (int)drop);
        var half = BigInteger.One << (int)(drop - 1);
        int cmp = dropped.CompareTo(half);
        if (cmp > 0 || (cmp == 0 && (sticky || !mantissa.IsEven)))
        {
            mantissa += 1;
        }

        // mantissa * 2^(exponent - precision + 1), exact because mantissa has at most 54 bits.
        long scale = exponent - precision + 1;
        double result = (double)(ulong)mantissa;
        result = ScaleByPowerOfTwo(result, scale);
        return negative ? -result : result;
    }

    private static double ScaleByPowerOfTwo(double value, long scale)
    {
        while (scale > 1000)
        {
            value *= PowerOfTwo(1000);
            scale -= 1000;
        }

        while (scale < -1000)
        {
            value *= PowerOfTwo(-1000);
            scale += 1000;
        }

        return value * PowerOfTwo((int)scale);
    }

    private static double PowerOfTwo(int k) => BitConverter.Int64BitsToDouble((long)(k + 1023) << 52);

    internal static long BitLength(BigInteger value)
    {
        byte[] bytes = value.ToByteArray();
        int top = bytes.Length - 1;
        while (top > 0 && bytes[top] == 0)
        {
            top--;
        }

        int b = bytes[top];
        int bitsInTop = 0;
        while (b != 0)
        {
            bitsInTop++;
            b >>= 1;
        }

        return (top * 8L) + bitsInTop;
    }
}
