using System.Globalization;
using MotionSpec.Evaluation.Inputs;
using MotionSpec.Language.Binding;

namespace MotionSpec.Evaluation.Sweeps;

/// <summary>Reads <c>--t VALUE</c> and <c>--t START:STEP:STOP</c> (seconds unless a time unit is written).</summary>
public static class TimeSampleParser
{
    /// <summary>
    /// Parses <paramref name="text"/>; on failure <paramref name="error"/> says what is wrong in words for the
    /// command line (exit 2).
    /// </summary>
    public static bool TryParse(string text, out TimeSamples samples, out string? error)
    {
        ArgumentNullException.ThrowIfNull(text);
        samples = TimeSamples.Default;
        var parts = text.Split(':');
        if (parts.Length != 1 && parts.Length != 3)
        {
            error = $"--t '{text}': expected a time or START:STEP:STOP, such as 0:100ms:2s";
            return false;
        }

        var values = new double[parts.Length];
        string[] roles = parts.Length == 1 ? ["time"] : ["start", "step", "stop"];
        for (var i = 0; i < parts.Length; i++)
        {
            if (!TryReadSeconds(parts[i], out values[i], out var problem))
            {
                error = $"--t '{text}': the {roles[i]} {problem}";
                return false;
            }
        }

        if (parts.Length == 1)
        {
            samples = new TimeSamples(values[0], 0, 1);
            error = null;
            return true;
        }

        var (start, step, stop) = (values[0], values[1], values[2]);
        if (!(step > 0))
        {
            error = $"--t '{text}': the step must be greater than zero";
            return false;
        }

        if (stop < start)
        {
            error = $"--t '{text}': the stop time is before the start time";
            return false;
        }

        // n = floor((stop - start) / step + 0.5), samples i = 0..n; compared in doubles before any cast.
        var n = Math.Floor(((stop - start) / step) + 0.5);
        if (!(n + 1 <= EvaluationLimits.MaxSamples))
        {
            var count = double.IsFinite(n) ? (n + 1).ToString("R", CultureInfo.InvariantCulture) : "too many";
            error = string.Create(
                CultureInfo.InvariantCulture,
                $"--t '{text}': the sweep has {count} samples, more than the limit of {EvaluationLimits.MaxSamples} samples per sweep");
            return false;
        }

        samples = new TimeSamples(start, step, (int)n + 1);
        error = null;
        return true;
    }

    private static bool TryReadSeconds(string part, out double seconds, out string? problem)
    {
        if (!QuantityText.TryParse(part.Trim(), out var quantity, out problem))
        {
            seconds = 0;
            problem = $"'{part}' {problem}";
            return false;
        }

        if (quantity.Unit is { } unit && unit != Dimension.TimeDimension)
        {
            seconds = 0;
            problem = $"'{part}' is not a time: its unit is of {unit}";
            return false;
        }

        seconds = quantity.Value;
        return true;
    }
}
