using System.Globalization;
using System.Text;
using MotionSpec.Evaluation.ClosedForm;
using MotionSpec.Kinematics;
using MotionSpec.Language.Binding;

namespace MotionSpec.Evaluation.Output;

/// <summary>
/// Writes a run as CSV: a header <c>report,t,position.x,...</c> with every point quantity then every frame
/// quantity, and one row per report and instant (reports in file order); cells of the other kind stay empty.
/// </summary>
public static class CsvWriter
{
    /// <summary>The header line, without its line end.</summary>
    public static string Header()
    {
        var header = new StringBuilder("report,t");
        foreach (var quantity in QuantityInfo.PointQuantities.Concat(QuantityInfo.FrameQuantities))
        {
            var key = QuantityInfo.Key(quantity);
            header.Append(',').Append(key).Append(".x,").Append(key).Append(".y,").Append(key).Append(".z");
        }

        return header.ToString();
    }

    /// <summary>Writes the whole run (lines end with <c>\n</c>).</summary>
    public static void Write(EvaluationRun run, TextWriter writer)
    {
        ArgumentNullException.ThrowIfNull(run);
        ArgumentNullException.ThrowIfNull(writer);
        writer.Write(Header());
        writer.Write('\n');
        var values = new double[run.MaxWidth];
        var pointCells = QuantityInfo.PointQuantities.Count * 3;
        var frameCells = QuantityInfo.FrameQuantities.Count * 3;

        // Numbers are formatted straight into one line buffer: a million-row sweep allocates nothing per cell.
        var longestName = run.Reports.Count == 0 ? 0 : run.Reports.Max(m => m.Name.Length);
        var line = new char[longestName + (64 * (3 + pointCells + frameCells))];
        for (var r = 0; r < run.Reports.Count; r++)
        {
            var report = run.Reports[r];
            var isPoint = report.Report.Kind == ReportKind.Point;
            for (var s = 0; s < run.Samples.Count; s++)
            {
                run.Evaluate(r, s, values);
                var n = 0;
                report.Name.AsSpan().CopyTo(line);
                n += report.Name.Length;
                line[n++] = ',';
                n += Format(run.Samples.At(s), line.AsSpan(n));
                if (!isPoint)
                {
                    line.AsSpan(n, pointCells).Fill(',');
                    n += pointCells;
                }

                for (var i = 0; i < report.Quantities.Count * 3; i++)
                {
                    line[n++] = ',';
                    n += Format(values[i], line.AsSpan(n));
                }

                if (isPoint)
                {
                    line.AsSpan(n, frameCells).Fill(',');
                    n += frameCells;
                }

                line[n++] = '\n';
                writer.Write(line, 0, n);
            }
        }
    }

    private static int Format(double value, Span<char> destination)
    {
        // "R" is the shortest text that reads back as the same double; 64 characters always hold it.
        value.TryFormat(destination, out var written, "R", CultureInfo.InvariantCulture);
        return written;
    }
}
