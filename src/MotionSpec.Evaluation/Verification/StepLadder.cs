using MathNet.Numerics.Differentiation;

namespace MotionSpec.Evaluation.Verification;

/// <summary>
/// First and second time derivatives of a vector-valued function by central finite differences
/// (MathNet.Numerics' nine-point coefficients, eighth order), with the step chosen per group of components:
/// steps halve down a ladder spanning many decades, and a group keeps the step where halving changes its
/// estimate least, which balances truncation against rounding without knowing the motion's time scale.
/// </summary>
internal sealed class StepLadder
{
    private const int StencilPoints = 9;
    private const int Half = StencilPoints / 2;
    private const int LargestStepExponent = 14;   // 2^14 s, about 4.5 h: slow motions such as the Earth's turn
    private const int Levels = 38;                 // down to 2^-23 s, about 0.1 us: fast rotors

    private static readonly double[] FirstCoefficients = new FiniteDifferenceCoefficients(StencilPoints).GetCoefficients(Half, 1);
    private static readonly double[] SecondCoefficients = new FiniteDifferenceCoefficients(StencilPoints).GetCoefficients(Half, 2);

    /// <summary>
    /// Fills <paramref name="value"/>, <paramref name="first"/> and <paramref name="second"/> with the
    /// function, its first and its second derivative at <paramref name="center"/>. <paramref name="f"/>
    /// writes the function's components at an instant into its buffer.
    /// </summary>
    public static void Differentiate(
        Action<double, double[]> f,
        double center,
        int size,
        IReadOnlyList<(int Start, int Length)> groups,
        double[] value,
        double[] first,
        double[] second)
    {
        var firsts = new double[Levels][];
        var seconds = new double[Levels][];
        var sample = new double[size];
        f(center, sample);
        Array.Copy(sample, value, size);

        for (var level = 0; level < Levels; level++)
        {
            var h = Math.ScaleB(1.0, LargestStepExponent - level);
            var d1 = new double[size];
            var d2 = new double[size];
            for (var k = 0; k < StencilPoints; k++)
            {
                if (k == Half)
                {
                    Accumulate(value, k, d1, d2);
                    continue;
                }

                f(center + ((k - Half) * h), sample);
                Accumulate(sample, k, d1, d2);
            }

            for (var i = 0; i < size; i++)
            {
                d1[i] /= h;
                d2[i] /= h * h;
            }

            firsts[level] = d1;
            seconds[level] = d2;
        }

        foreach (var (start, length) in groups)
        {
            Choose(firsts, start, length, first);
            Choose(seconds, start, length, second);
        }
    }

    private static void Accumulate(double[] sample, int k, double[] d1, double[] d2)
    {
        for (var i = 0; i < sample.Length; i++)
        {
            d1[i] += FirstCoefficients[k] * sample[i];
            d2[i] += SecondCoefficients[k] * sample[i];
        }
    }

    private static void Choose(double[][] estimates, int start, int length, double[] result)
    {
        var best = double.PositiveInfinity;
        var bestLevel = -1;
        for (var level = 0; level + 1 < Levels; level++)
        {
            var change = 0.0;
            for (var i = start; i < start + length; i++)
            {
                var d = estimates[level][i] - estimates[level + 1][i];
                change += d * d;
            }

            // NaN never compares below best, so a level that left a function's domain is never chosen.
            if (change < best)
            {
                best = change;
                bestLevel = level + 1;
            }
        }

        for (var i = start; i < start + length; i++)
        {
            result[i] = bestLevel < 0 ? double.NaN : estimates[bestLevel][i];
        }
    }
}
