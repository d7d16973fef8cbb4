using MotionSpec.Evaluation.ClosedForm;
using MotionSpec.Kinematics;

namespace MotionSpec.Plotting;

/// <summary>Evaluates one point report over a prepared sweep and turns the samples into the curves of a term plot.</summary>
public static class TermSweepSampler
{
    /// <summary>The total acceleration's name in legends.</summary>
    public const string TotalLabel = "total acceleration";

    /// <summary>
    /// Samples report 0 of <paramref name="run"/> (a point report, prepared alone) at every instant of the
    /// sweep; <paramref name="title"/> is the spec's title or file name.
    /// </summary>
    public static TermPlotData Sample(string title, EvaluationRun run)
    {
        ArgumentNullException.ThrowIfNull(run);
        var report = run.Reports[0];
        var quantities = report.Quantities;
        var total = Offset(quantities, Quantity.Acceleration);
        var terms = QuantityInfo.Terms.Select(q => Offset(quantities, q)).ToArray();
        var values = new double[run.MaxWidth];
        var samples = new List<TermSample>(run.Samples.Count);
        for (var i = 0; i < run.Samples.Count; i++)
        {
            run.Evaluate(0, i, values);
            samples.Add(new TermSample(run.Samples.At(i), terms.Select(offset => Vector(values, offset)).ToArray(), Vector(values, total)));
        }

        var r = report.Report;
        var subtitle = $"report {r.Name}: point {r.SubjectName} seen from {r.Observer.Name}, moving frame {(r.Via ?? r.SubjectFrame).Name}, basis {r.Basis.Name}";
        return TermPlotBuilder.Build(title, subtitle, QuantityInfo.Terms.Select(QuantityInfo.TradeName).ToArray(), TotalLabel, samples, r.Basis.Name);
    }

    private static int Offset(IReadOnlyList<Quantity> quantities, Quantity quantity)
    {
        for (var i = 0; i < quantities.Count; i++)
        {
            if (quantities[i] == quantity)
            {
                return 3 * i;
            }
        }

        throw new ArgumentException("a point report has every acceleration quantity; this one lacks " + QuantityInfo.Key(quantity), nameof(quantities));
    }

    private static PlotVector Vector(double[] values, int offset) => new(values[offset], values[offset + 1], values[offset + 2]);
}
