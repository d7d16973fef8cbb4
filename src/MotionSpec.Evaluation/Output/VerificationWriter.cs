using System.Globalization;
using MotionSpec.Evaluation.Verification;
using MotionSpec.Kinematics;

namespace MotionSpec.Evaluation.Output;

/// <summary>Writes the outcome of <c>verify</c>: one aligned line per report with its worst error, then a verdict.</summary>
public static class VerificationWriter
{
    /// <summary>Writes <paramref name="outcome"/> for the spec shown as <paramref name="specName"/>.</summary>
    public static void Write(VerificationOutcome outcome, string specName, TextWriter writer)
    {
        ArgumentNullException.ThrowIfNull(outcome);
        ArgumentNullException.ThrowIfNull(writer);
        var inv = CultureInfo.InvariantCulture;
        var nameWidth = Math.Max("report".Length, outcome.Reports.Count == 0 ? 0 : outcome.Reports.Max(r => r.Name.Length));
        writer.Write($"{specName}: closed forms against the numeric path\n");
        writer.Write($"{"report".PadRight(nameWidth)}  {"worst error",-11}  {"in",-20}  {"at t [s]",-10}  states\n");
        foreach (var report in outcome.Reports)
        {
            var error = report.StatesCompared == 0 ? "-" : report.WorstError.ToString("0.0E+00", inv);
            var quantity = report.WorstQuantity is { } q ? QuantityInfo.Key(q) : "-";
            var time = report.WorstQuantity is null ? "-" : report.WorstTime.ToString("G6", inv);
            var states = report.StatesSkipped == 0
                ? report.StatesCompared.ToString(inv)
                : string.Create(inv, $"{report.StatesCompared} ({report.StatesSkipped} skipped: not finite)");
            var verdict = report.Passed(outcome.Tolerance) ? string.Empty : "  FAIL";
            writer.Write($"{report.Name.PadRight(nameWidth)}  {error,-11}  {quantity,-20}  {time,-10}  {states}{verdict}\n");
        }

        var failed = outcome.Reports.Count(r => !r.Passed(outcome.Tolerance));
        var tolerance = outcome.Tolerance.ToString("0E+00", inv);
        writer.Write(failed == 0
            ? string.Create(inv, $"all {outcome.Reports.Count} reports agree within {tolerance}\n")
            : string.Create(inv, $"{failed} of {outcome.Reports.Count} reports differ by more than {tolerance} (or could not be compared)\n"));
    }
}
