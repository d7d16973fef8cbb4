using MathNet.Numerics.Differentiation;

namespace MotionSpec.Evaluation.Verification;

/// <summary>
/// First and second time derivatives by central finite differences (MathNet.Numerics' nine-point
/// coefficients, eighth order) at a ladder of steps spanning many decades, so that slow motions (the Earth's
/// turn) and fast ones (a centrifuge) are both resolved. <c>Choose</c> then picks, for each quantity
/// built from the estimates, the step where the next step changes it least.
/// </summary>
internal static class StepLadder
{
    /// <summary>Number of steps on the ladder.</summary>
    public const int Levels = 33;                  // from 4.5 h down to about 1e-7 s

    private const int StencilPoints = 9;
    private const int Half = StencilPoints / 2;
    private const double LargestStep = 16384;      // s

    // Not a whole number: with steps halving, a periodic motion sampled far beyond its period aliases the
    // same way at every level (2^k mod 2 pi doubles along with 2^k), and the estimates agree while wrong.
    private const double Ratio = 2.2;

    // Successive estimates within 1e-3 of their size count as resolved.
    private const double Agreement = 1e-3;

    private static readonly double[] FirstCoefficients = new FiniteDifferenceCoefficients(StencilPoints).GetCoefficients(Half, 1);
    private static readonly double[] SecondCoefficients = new FiniteDifferenceCoefficients(StencilPoints).GetCoefficients(Half, 2);

    /// <summary>The step of a level, in seconds.</summary>
    public static double Step(int level) => LargestStep / Math.Pow(Ratio, level);

    /// <summary>
    /// The function at <paramref name="center"/> and, per level, its first and second derivative estimates.
    /// <paramref name="f"/> writes the function's <paramref name="size"/> components at an instant.
    /// </summary>
    public static (double[] Value, double[][] First, double[][] Second) Estimate(Action<double, double[]> f, double center, int size)
    {
        var firsts = new double[Levels][];
        var seconds = new double[Levels][];
        var value = new double[size];
        var sample = new double[size];
        f(center, value);
        for (var level = 0; level < Levels; level++)
        {
            var h = Step(level);
            var d1 = new double[size];
            var d2 = new double[size];
            for (var k = 0; k < StencilPoints; k++)
            {
                var at = k == Half ? value : sample;
                if (k != Half)
                {
                    f(center + ((k - Half) * h), sample);
                }

                for (var i = 0; i < size; i++)
                {
                    d1[i] += FirstCoefficients[k] * at[i];
                    d2[i] += SecondCoefficients[k] * at[i];
                }
            }

            for (var i = 0; i < size; i++)
            {
                d1[i] /= h;
                d2[i] /= h * h;
            }

            firsts[level] = d1;
            seconds[level] = d2;
        }

        return (value, firsts, seconds);
    }

    /// <summary>The best estimate of each component of a vector (see the scalar overload).</summary>
    public static Vec3 Choose(ReadOnlySpan<Vec3> estimates)
    {
        Span<double> column = stackalloc double[estimates.Length];
        Span<double> chosen = stackalloc double[3];
        for (var axis = 0; axis < 3; axis++)
        {
            for (var level = 0; level < estimates.Length; level++)
            {
                column[level] = estimates[level][axis];
            }

            chosen[axis] = Choose(column);
        }

        return new Vec3(chosen[0], chosen[1], chosen[2]);
    }

    /// <summary>
    /// The best of a quantity's estimates, one per level. An estimate changes by much less than its size from
    /// one step to the next only once the step resolves the motion: with steps far beyond its time scale every
    /// estimate is noise divided by a large step, tiny but wrong, and so is the change between two of them.
    /// A level counts when it agrees with both neighbours (one chance agreement is not enough); of those, the
    /// one whose larger change is smallest has the least error. When none counts the quantity is zero within
    /// rounding at every step, and zero is returned; NaN when no level is finite. Components are chosen one by
    /// one, since one that is exactly quadratic in time agrees at every step and must not vouch for another.
    /// </summary>
    public static double Choose(ReadOnlySpan<double> estimates)
    {
        var best = double.PositiveInfinity;
        var bestLevel = -1;
        var anyFinite = false;
        for (var level = 0; level < estimates.Length; level++)
        {
            anyFinite |= double.IsFinite(estimates[level]);
            if (level == 0 || level + 1 == estimates.Length)
            {
                continue;
            }

            var before = Math.Abs(estimates[level] - estimates[level - 1]);
            var after = Math.Abs(estimates[level + 1] - estimates[level]);
            var size = Math.Max(Math.Abs(estimates[level]), Math.Max(Math.Abs(estimates[level - 1]), Math.Abs(estimates[level + 1])));
            var change = Math.Max(before, after);

            // NaN never compares true, so a level next to one that left a function's domain is never chosen.
            if (change <= Agreement * size && change < best)
            {
                best = change;
                bestLevel = level;
            }
        }

        if (bestLevel >= 0)
        {
            return estimates[bestLevel];
        }

        return anyFinite ? 0 : double.NaN;
    }
}
