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
        var line = new StringBuilder();
        for (var r = 0; r < run.Reports.Count; r++)
        {
            var report = run.Reports[r];
            var isPoint = report.Report.Kind == ReportKind.Point;
            for (var s = 0; s < run.Samples.Count; s++)
            {
                run.Evaluate(r, s, values);
                line.Clear();
                line.Append(report.Name).Append(',').Append(NumberText.RoundTrip(run.Samples.At(s)));
                if (!isPoint)
                {
                    line.Append(',', pointCells);
                }

                for (var i = 0; i < report.Quantities.Count * 3; i++)
                {
                    line.Append(',').Append(NumberText.RoundTrip(values[i]));
                }

                if (isPoint)
                {
                    line.Append(',', frameCells);
                }

                line.Append('\n');
                writer.Write(line);
            }
        }
    }
}
