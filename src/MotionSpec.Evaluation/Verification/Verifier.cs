using MotionSpec.Evaluation.ClosedForm;
using MotionSpec.Evaluation.Inputs;
using MotionSpec.Kinematics;
using MotionSpec.Language.Diagnostics;

namespace MotionSpec.Evaluation.Verification;

/// <summary>
/// Compares every report's closed forms with the independent numeric path at deterministic random states.
/// </summary>
public static class Verifier
{
    /// <summary>The largest error <c>verify</c> accepts.</summary>
    public const double Tolerance = 1e-6;

    /// <summary>States compared per spec by default.</summary>
    public const int DefaultStates = 24;

    /// <summary>The seed of the default states, so that a run can be repeated exactly.</summary>
    public const int DefaultSeed = 20_261_201;

    /// <summary>
    /// Runs the comparison. Returns null, with a MOT5 error in <paramref name="diagnostics"/>, when the spec's
    /// own params are not finite.
    /// </summary>
    public static VerificationOutcome? Run(KinematicModel model, DiagnosticBag diagnostics, int states = DefaultStates, int seed = DefaultSeed)
    {
        ArgumentNullException.ThrowIfNull(model);
        ArgumentNullException.ThrowIfNull(diagnostics);
        var evaluator = ModelEvaluator.Compile(model);
        var before = diagnostics.Items.Count(d => d.IsError);
        var @params = ParameterResolver.Resolve(model, EvaluationInputs.Defaults(model.Spec), diagnostics);
        if (diagnostics.Items.Count(d => d.IsError) > before)
        {
            return null;
        }

        var comparisons = Compare(evaluator, @params, states, seed);
        return new VerificationOutcome(comparisons, Tolerance);
    }

    /// <summary>Per report: the worst error and where it occurred; the work behind <see cref="Run"/>.</summary>
    internal static ReportVerification[] Compare(ModelEvaluator evaluator, double[] @params, int states, int seed)
    {
        var spec = evaluator.Model.Spec;
        var reference = new NumericReference(spec);
        var generator = new RandomStates(spec, @params, seed);
        var reports = evaluator.Reports;
        var worst = new double[reports.Count];
        var worstQuantity = new Quantity?[reports.Count];
        var worstTime = new double[reports.Count];
        var compared = new int[reports.Count];
        var skipped = new int[reports.Count];
        var inputs = new double[evaluator.Layout.Symbols.Count];
        var values = new double[reports.Count == 0 ? 0 : reports.Max(r => r.Width)];

        for (var n = 0; n < states; n++)
        {
            var state = generator.Next();
            var numeric = Reference(reference, state, reports.Count);
            for (var r = 0; r < reports.Count; r++)
            {
                var report = reports[r];
                evaluator.Evaluate(report, state, inputs, values);
                var closed = ToVectors(values, report.Quantities.Count);
                if (!closed.All(v => v.IsFinite))
                {
                    skipped[r]++;
                    continue;
                }

                compared[r]++;
                var errors = Errors(report.Quantities, closed, numeric[report.Report.Index]);
                for (var i = 0; i < errors.Length; i++)
                {
                    // A NaN from the numeric path counts as a failure, never as agreement.
                    if (!(errors[i] <= worst[r]))
                    {
                        worst[r] = double.IsNaN(errors[i]) ? double.PositiveInfinity : errors[i];
                        worstQuantity[r] = report.Quantities[i];
                        worstTime[r] = state.Time;
                    }
                }
            }
        }

        return reports
            .Select((report, r) => new ReportVerification(report.Report.Name, worst[r], worstQuantity[r], worstTime[r], compared[r], skipped[r]))
            .ToArray();
    }

    /// <summary>|a - b| / max(|b|, S, 1e-12) per vector, S the largest |b| among vectors of the same dimension.</summary>
    internal static double[] Errors(IReadOnlyList<Quantity> quantities, Vec3[] closed, Vec3[] numeric)
    {
        var errors = new double[quantities.Count];
        for (var i = 0; i < quantities.Count; i++)
        {
            var dimension = QuantityInfo.DimensionOf(quantities[i]);
            var scale = 0.0;
            for (var j = 0; j < quantities.Count; j++)
            {
                if (QuantityInfo.DimensionOf(quantities[j]) == dimension)
                {
                    scale = Math.Max(scale, numeric[j].Norm);
                }
            }

            var b = numeric[i];
            errors[i] = (closed[i] - b).Norm / Math.Max(Math.Max(b.Norm, scale), 1e-12);
        }

        return errors;
    }

    private static Vec3[][] Reference(NumericReference reference, MotionState state, int reportCount)
    {
        try
        {
            return reference.Evaluate(state);
        }
        catch (InvalidOperationException)
        {
            // A bound tree of a shape the numeric path does not know: every report fails, nothing crashes.
            return Enumerable.Range(0, reportCount).Select(_ => Enumerable.Repeat(new Vec3(double.NaN, double.NaN, double.NaN), 8).ToArray()).ToArray();
        }
    }

    private static Vec3[] ToVectors(double[] values, int count)
    {
        var vectors = new Vec3[count];
        for (var i = 0; i < count; i++)
        {
            vectors[i] = new Vec3(values[3 * i], values[(3 * i) + 1], values[(3 * i) + 2]);
        }

        return vectors;
    }
}
