using System.Globalization;

namespace MotionSpec.Evaluation.Output;

/// <summary>How numbers are written: round-trip for machines, six significant digits for people.</summary>
internal static class NumberText
{
    /// <summary>The shortest text that reads back as the same double, invariant culture.</summary>
    public static string RoundTrip(double value) => value.ToString("R", CultureInfo.InvariantCulture);

    /// <summary>
    /// Six significant digits; a component below 1e-12 of <paramref name="scale"/> (the largest comparable
    /// magnitude) is shown as 0, since it is rounding noise rather than motion.
    /// </summary>
    public static string ForPeople(double value, double scale)
    {
        if (Math.Abs(value) <= 1e-12 * scale || value == 0)
        {
            return "0";
        }

        return value.ToString("G6", CultureInfo.InvariantCulture);
    }
}
