using System.Globalization;
using System.Numerics;

namespace MotionSpec.Symbolic;

/// <summary>An exact rational number in lowest terms with a positive denominator.</summary>
public readonly struct Rational : IEquatable<Rational>, IComparable<Rational>
{
    private readonly BigInteger _numerator;
    // Stored as denominator - 1 so that default(Rational) is a valid zero (0/1).
    private readonly BigInteger _denominatorMinusOne;

    /// <summary>Creates numerator/denominator reduced to lowest terms.</summary>
    /// <exception cref="DivideByZeroException">The denominator is zero.</exception>
    public Rational(BigInteger numerator, BigInteger denominator)
    {
        if (denominator.IsZero)
        {
            throw new DivideByZeroException("A rational number needs a non-zero denominator.");
        }

        if (denominator.Sign < 0)
        {
            numerator = -numerator;
            denominator = -denominator;
        }

        if (!denominator.IsOne)
        {
            var gcd = BigInteger.GreatestCommonDivisor(numerator, denominator);
            if (!gcd.IsOne && !gcd.IsZero)
            {
                numerator /= gcd;
                denominator /= gcd;
            }
        }

        if (numerator.IsZero)
        {
            denominator = BigInteger.One;
        }

        _numerator = numerator;
        _denominatorMinusOne = denominator - BigInteger.One;
    }

    private Rational(BigInteger numerator, BigInteger denominator, bool reduced)
    {
        _ = reduced;
        _numerator = numerator;
        _denominatorMinusOne = denominator - BigInteger.One;
    }

    /// <summary>The numerator (carries the sign).</summary>
    public BigInteger Numerator => _numerator;

    /// <summary>The denominator, always positive.</summary>
    public BigInteger Denominator => _denominatorMinusOne + BigInteger.One;

    /// <summary>0.</summary>
    public static Rational Zero => default;

    /// <summary>1.</summary>
    public static Rational One => new(BigInteger.One, BigInteger.One, reduced: true);

    /// <summary>-1.</summary>
    public static Rational MinusOne => new(BigInteger.MinusOne, BigInteger.One, reduced: true);

    /// <summary>1/2.</summary>
    public static Rational Half => new(BigInteger.One, new BigInteger(2), reduced: true);

    /// <summary>True for 0.</summary>
    public bool IsZero => _numerator.IsZero;

    /// <summary>True for 1.</summary>
    public bool IsOne => _numerator.IsOne && _denominatorMinusOne.IsZero;

    /// <summary>True when the denominator is 1.</summary>
    public bool IsInteger => _denominatorMinusOne.IsZero;

    /// <summary>-1, 0 or 1.</summary>
    public int Sign => _numerator.Sign;

    /// <summary>The absolute value.</summary>
    public Rational Abs() => Sign < 0 ? -this : this;

    /// <summary>Creates an integer rational.</summary>
    public static Rational FromInteger(BigInteger value) => new(value, BigInteger.One, reduced: true);

    /// <summary>Implicit conversion from int.</summary>
    public static implicit operator Rational(int value) => FromInteger(value);

    /// <summary>Implicit conversion from long.</summary>
    public static implicit operator Rational(long value) => FromInteger(value);

    /// <summary>Named alternative to the implicit conversion from long.</summary>
    public static Rational FromInt64(long value) => FromInteger(value);

    /// <summary>True when the value is an integer that fits in an int; gives it.</summary>
    public bool TryGetInt32(out int value)
    {
        if (IsInteger && _numerator >= int.MinValue && _numerator <= int.MaxValue)
        {
            value = (int)_numerator;
            return true;
        }

        value = 0;
        return false;
    }

    /// <summary>Sum.</summary>
    public static Rational operator +(Rational a, Rational b)
    {
        if (a.IsInteger && b.IsInteger)
        {
            return FromInteger(a._numerator + b._numerator);
        }

        return new Rational(a._numerator * b.Denominator + b._numerator * a.Denominator, a.Denominator * b.Denominator);
    }

    /// <summary>Difference.</summary>
    public static Rational operator -(Rational a, Rational b) => a + (-b);

    /// <summary>Negation.</summary>
    public static Rational operator -(Rational a) => new(-a._numerator, a.Denominator, reduced: true);

    /// <summary>Product.</summary>
    public static Rational operator *(Rational a, Rational b)
    {
        if (a.IsInteger && b.IsInteger)
        {
            return FromInteger(a._numerator * b._numerator);
        }

        return new Rational(a._numerator * b._numerator, a.Denominator * b.Denominator);
    }

    /// <summary>Quotient.</summary>
    /// <exception cref="DivideByZeroException">b is zero.</exception>
    public static Rational operator /(Rational a, Rational b) => new(a._numerator * b.Denominator, a.Denominator * b._numerator);

    /// <summary>Named alternative to the + operator.</summary>
    public static Rational Add(Rational left, Rational right) => left + right;

    /// <summary>Named alternative to the - operator.</summary>
    public static Rational Subtract(Rational left, Rational right) => left - right;

    /// <summary>Named alternative to the * operator.</summary>
    public static Rational Multiply(Rational left, Rational right) => left * right;

    /// <summary>Named alternative to the / operator.</summary>
    public static Rational Divide(Rational left, Rational right) => left / right;

    /// <summary>Named alternative to unary minus.</summary>
    public static Rational Negate(Rational item) => -item;

    /// <summary>Equality.</summary>
    public static bool operator ==(Rational a, Rational b) => a.Equals(b);

    /// <summary>Inequality.</summary>
    public static bool operator !=(Rational a, Rational b) => !a.Equals(b);

    /// <summary>Less than.</summary>
    public static bool operator <(Rational a, Rational b) => a.CompareTo(b) < 0;

    /// <summary>Greater than.</summary>
    public static bool operator >(Rational a, Rational b) => a.CompareTo(b) > 0;

    /// <summary>Less than or equal.</summary>
    public static bool operator <=(Rational a, Rational b) => a.CompareTo(b) <= 0;

    /// <summary>Greater than or equal.</summary>
    public static bool operator >=(Rational a, Rational b) => a.CompareTo(b) >= 0;

    /// <summary>Integer power (negative exponents give the reciprocal power).</summary>
    /// <exception cref="DivideByZeroException">Zero to a negative power.</exception>
    public Rational Pow(int exponent)
    {
        if (exponent == 0)
        {
            return One;
        }

        var n = BigInteger.Pow(_numerator, Math.Abs(exponent));
        var d = BigInteger.Pow(Denominator, Math.Abs(exponent));
        return exponent > 0 ? new Rational(n, d, reduced: true) : new Rational(d, n);
    }

    /// <summary>Structural equality (values in lowest terms).</summary>
    public bool Equals(Rational other) => _numerator.Equals(other._numerator) && _denominatorMinusOne.Equals(other._denominatorMinusOne);

    /// <inheritdoc />
    public override bool Equals(object? obj) => obj is Rational other && Equals(other);

    /// <summary>A deterministic hash (independent of process and runtime).</summary>
    public override int GetHashCode() => HashMix.Combine(HashOf(_numerator), HashOf(_denominatorMinusOne));

    private static int HashOf(BigInteger value)
    {
        if (value >= long.MinValue && value <= long.MaxValue)
        {
            long v = (long)value;
            return HashMix.Combine((int)v, (int)(v >> 32));
        }

        int h = 17;
        foreach (byte b in value.ToByteArray())
        {
            h = HashMix.Combine(h, b);
        }

        return h;
    }

    /// <summary>Numeric order.</summary>
    public int CompareTo(Rational other)
    {
        if (IsInteger && other.IsInteger)
        {
            return _numerator.CompareTo(other._numerator);
        }

        return (_numerator * other.Denominator).CompareTo(other._numerator * Denominator);
    }

    /// <summary>"3", "-3/5" (invariant culture).</summary>
    public override string ToString() => IsInteger
        ? _numerator.ToString(CultureInfo.InvariantCulture)
        : _numerator.ToString(CultureInfo.InvariantCulture) + "/" + Denominator.ToString(CultureInfo.InvariantCulture);

    /// <summary>The nearest double (correctly rounded, ties to even); huge values give +-Infinity.</summary>
    public double ToDouble() => RationalToDouble.Convert(_numerator, Denominator);

    /// <summary>Parses a decimal literal such as "1.5", ".5", "2e-3" or "6.02E+3" exactly.</summary>
    /// <exception cref="FormatException">The text is not a decimal literal.</exception>
    public static Rational FromDecimalString(string s)
    {
        if (!TryFromDecimalString(s, out var value))
        {
            throw new FormatException("Not a decimal number: '" + s + "'.");
        }

        return value;
    }

    /// <summary>Parses a decimal literal exactly; false when the text is not one (or its exponent is absurd).</summary>
    public static bool TryFromDecimalString(string? s, out Rational value)
    {
        value = Zero;
        if (string.IsNullOrEmpty(s))
        {
            return false;
        }

        int i = 0;
        bool negative = false;
        if (s![0] == '-' || s[0] == '+')
        {
            negative = s[0] == '-';
            i++;
        }

        var mantissa = BigInteger.Zero;
        int digits = 0;
        int fractionDigits = 0;
        while (i < s.Length && s[i] >= '0' && s[i] <= '9')
        {
            mantissa = mantissa * 10 + (s[i] - '0');
            digits++;
            i++;
        }

        if (i < s.Length && s[i] == '.')
        {
            i++;
            int before = i;
            while (i < s.Length && s[i] >= '0' && s[i] <= '9')
            {
                mantissa = mantissa * 10 + (s[i] - '0');
                fractionDigits++;
                i++;
            }

            if (i == before)
            {
                return false;
            }

            digits += fractionDigits;
        }

        if (digits == 0)
        {
            return false;
        }

        long exponent = 0;
        if (i < s.Length && (s[i] == 'e' || s[i] == 'E'))
        {
            i++;
            bool negativeExponent = false;
            if (i < s.Length && (s[i] == '-' || s[i] == '+'))
            {
                negativeExponent = s[i] == '-';
                i++;
            }

            int before = i;
            while (i < s.Length && s[i] >= '0' && s[i] <= '9')
            {
                exponent = exponent * 10 + (s[i] - '0');
                if (exponent > 100_000)
                {
                    return false;
                }

                i++;
            }

            if (i == before)
            {
                return false;
            }

            if (negativeExponent)
            {
                exponent = -exponent;
            }
        }

        if (i != s.Length)
        {
            return false;
        }

        long scale = exponent - fractionDigits;
        if (negative)
        {
            mantissa = -mantissa;
        }

        value = scale >= 0
            ? FromInteger(mantissa * BigInteger.Pow(10, (int)scale))
            : new Rational(mantissa, BigInteger.Pow(10, (int)-scale));
        return true;
    }
}
