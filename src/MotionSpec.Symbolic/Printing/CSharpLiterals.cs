using System.Globalization;
using System.Numerics;

namespace MotionSpec.Symbolic;

/// <summary>Exact-as-possible C# literals for rationals: exact binary values directly, else a quotient of exact integers, else round-trip digits.</summary>
internal static class CSharpLiterals
{
    private static readonly BigInteger DoubleExactLimit = BigInteger.One << 53;
    private static readonly BigInteger FloatExactLimit = BigInteger.One << 24;

    public static string Of(Rational v, NumericType type)
    {
        bool isFloat = type == NumericType.Float;
        var limit = isFloat ? FloatExactLimit : DoubleExactLimit;
        var n = BigInteger.Abs(v.Numerator);
        var d = v.Denominator;
        string sign = v.Sign < 0 ? "-" : string.Empty;
        if (n < limit && IsPowerOfTwo(d) && RationalToDouble.BitLength(d) <= (isFloat ? 100 : 1000))
        {
            return sign + Digits(Math.Abs(v.ToDouble()), isFloat);
        }

        if (n < limit && d < limit)
        {
            return "(" + sign + Digits((double)n, isFloat) + " / " + Digits((double)d, isFloat) + ")";
        }

        return sign + Digits(Math.Abs(v.ToDouble()), isFloat);
    }

    private static bool IsPowerOfTwo(BigInteger d) => !d.IsZero && (d & (d - 1)).IsZero;

    private static string Digits(double value, bool isFloat)
    {
        if (isFloat)
        {
            float f = (float)value;
            if (float.IsInfinity(f))
            {
                return "float.PositiveInfinity";
            }

            string s = f.ToString("R", CultureInfo.InvariantCulture);
            if (float.Parse(s, CultureInfo.InvariantCulture) != f)
            {
                s = f.ToString("G9", CultureInfo.InvariantCulture);
            }

            return s + "f";
        }

        if (double.IsInfinity(value))
        {
            return "double.PositiveInfinity";
        }

        string r = value.ToString("R", CultureInfo.InvariantCulture);
        if (double.Parse(r, CultureInfo.InvariantCulture) != value)
        {
            r = value.ToString("G17", CultureInfo.InvariantCulture);
        }

        if (r.IndexOf('.') < 0 && r.IndexOf('E') < 0)
        {
            r += ".0";
        }

        return r;
    }
}
