using System.Text;
using MotionSpec.Evaluation.ClosedForm;
using MotionSpec.Kinematics;
using MotionSpec.Language.Binding;

namespace MotionSpec.Evaluation.Output;

/// <summary>
/// Writes a run for a person: per report a title line, then for each instant one row per quantity with its SI
/// unit, the three components in the report's basis and the magnitude, right-aligned, six significant digits.
/// </summary>
public static class TableWriter
{
    private const int NumberWidth = 14;

    /// <summary>Writes the whole run (lines end with <c>\n</c>).</summary>
    public static void Write(EvaluationRun run, TextWriter writer)
    {
        ArgumentNullException.ThrowIfNull(run);
        ArgumentNullException.ThrowIfNull(writer);
        var values = new double[run.MaxWidth];
        var line = new StringBuilder();
        for (var r = 0; r < run.Reports.Count; r++)
        {
            var motion = run.Reports[r];
            if (r > 0)
            {
                writer.Write('\n');
            }

            writer.Write(Title(motion.Report));
            writer.Write('\n');
            var labels = motion.Quantities.Select(Label).ToArray();
            var labelWidth = Math.Max(labels.Max(l => l.Length), "quantity".Length);
            var times = Enumerable.Range(0, run.Samples.Count).Select(s => NumberText.RoundTrip(Round(run.Samples.At(s))));
            var timeWidth = Math.Max("t [s]".Length, run.Samples.Count <= 10_000 ? times.Max(t => t.Length) : 12);

            line.Clear();
            line.Append("t [s]".PadLeft(timeWidth)).Append("  ").Append("quantity".PadRight(labelWidth));
            foreach (var column in new[] { "x", "y", "z", "magnitude" })
            {
                line.Append(column.PadLeft(NumberWidth));
            }

            writer.Write(line.Append('\n'));
            for (var s = 0; s < run.Samples.Count; s++)
            {
                run.Evaluate(r, s, values);
                var time = NumberText.RoundTrip(Round(run.Samples.At(s)));
                for (var i = 0; i < motion.Quantities.Count; i++)
                {
                    var scale = ScaleOf(motion.Quantities, values, motion.Quantities[i]);
                    line.Clear();
                    line.Append((i == 0 ? time : string.Empty).PadLeft(timeWidth)).Append("  ").Append(labels[i].PadRight(labelWidth));
                    var x = values[3 * i];
                    var y = values[(3 * i) + 1];
                    var z = values[(3 * i) + 2];
                    foreach (var component in new[] { x, y, z, Math.Sqrt((x * x) + (y * y) + (z * z)) })
                    {
                        line.Append(NumberText.ForPeople(component, scale).PadLeft(NumberWidth));
                    }

                    writer.Write(line.Append('\n'));
                }
            }
        }

        // The table is the form people act on, so it ends with the caution that the derivations carry too.
        writer.Write('\n');
        writer.Write(Caution);
        writer.Write('\n');
    }

    /// <summary>The closing line of every table.</summary>
    public const string Caution =
        "Caution: these values follow from the spec alone. Loads on people, payloads or structures must be checked " +
        "against the applicable codes and standards and by a qualified engineer.";

    /// <summary>"tipInQuay: point tip seen from quay, terms relative to hook, basis quay".</summary>
    private static string Title(Language.Binding.Symbols.ReportSymbol report) =>
        report.Kind == ReportKind.Point
            ? $"{report.Name}: point {report.SubjectName} seen from {report.Observer.Name}, terms relative to {report.Via?.Name}, basis {report.Basis.Name}"
            : $"{report.Name}: frame {report.SubjectName} seen from {report.Observer.Name}, basis {report.Basis.Name}";

    private static string Label(Quantity quantity) =>
        $"{QuantityInfo.Key(quantity)} [{QuantityInfo.DimensionOf(quantity).SiUnit()}]";

    // Sweep instants such as 0.1 * 3 print as 0.3, not 0.30000000000000004, in the table meant for reading.
    private static double Round(double t) => double.Parse(t.ToString("G12", System.Globalization.CultureInfo.InvariantCulture), System.Globalization.CultureInfo.InvariantCulture);

    private static double ScaleOf(IReadOnlyList<Quantity> quantities, double[] values, Quantity of)
    {
        var dimension = QuantityInfo.DimensionOf(of);
        var scale = 0.0;
        for (var i = 0; i < quantities.Count; i++)
        {
            if (QuantityInfo.DimensionOf(quantities[i]) == dimension)
            {
                var x = values[3 * i];
                var y = values[(3 * i) + 1];
                var z = values[(3 * i) + 2];
                scale = Math.Max(scale, Math.Sqrt((x * x) + (y * y) + (z * z)));
            }
        }

        return scale;
    }
}
