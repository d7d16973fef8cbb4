using System.Numerics;

namespace MotionSpec.Language.Binding;

/// <summary>
/// An exact constant (Numerator / Denominator) * pi^PiPower, so that decimal literals and units such as
/// <c>deg</c>, <c>rpm</c> and <c>in</c> keep their defined values without rounding. Denominator is positive.
/// </summary>
public readonly record struct ExactNumber(BigInteger Numerator, BigInteger Denominator, int PiPower)
{
    /// <summary>The nearest double (infinite when the value is beyond the range of doubles).</summary>
    public double ToDouble()
    {
        if (Numerator.IsZero)
        {
            return 0;
        }

        // Shift both parts down together so that large literals such as 1e300 / 1e-300 still divide exactly enough.
        var shift = Math.Max(0, (8 * Math.Max(Numerator.ToByteArray().Length, Denominator.ToByteArray().Length)) - 1000);
        var ratio = (double)(Numerator >> shift) / (double)(Denominator >> shift);
        if (Denominator >> shift == 0)
        {
            ratio = Numerator.Sign * double.PositiveInfinity;
        }

        return ratio * Math.Pow(Math.PI, PiPower);
    }
}
