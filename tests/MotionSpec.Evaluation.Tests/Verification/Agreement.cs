using MotionSpec.Evaluation.ClosedForm;
using MotionSpec.Evaluation.Inputs;
using MotionSpec.Evaluation.Verification;
using MotionSpec.Kinematics;
using MotionSpec.Language.Diagnostics;

namespace MotionSpec.Evaluation.Tests.Verification;

/// <summary>The two properties every spec must have at random states, in CLI.md's error measure.</summary>
internal static class Agreement
{
    /// <summary>
    /// Closed forms against the independent numeric path (rotation matrices differentiated with
    /// MathNet.Numerics finite-difference coefficients): worst error per report.
    /// </summary>
    public static ReportVerification[] AgainstNumericPath(KinematicModel model, int states, int seed)
    {
        var evaluator = ModelEvaluator.Compile(model);
        var @params = ParameterResolver.Resolve(model, EvaluationInputs.Defaults(model.Spec), new DiagnosticBag());
        return Verifier.Compare(evaluator, @params, states, seed);
    }

    /// <summary>
    /// The largest |relative + centripetal + angular + coriolis + origin - acceleration| / max(|acceleration|,
    /// S, 1e-12) over the point reports and states, S the largest acceleration-like norm of that report.
    /// </summary>
    public static double TermsSumError(KinematicModel model, int states, int seed)
    {
        var evaluator = ModelEvaluator.Compile(model);
        var @params = ParameterResolver.Resolve(model, EvaluationInputs.Defaults(model.Spec), new DiagnosticBag());
        var generator = new RandomStates(model.Spec, @params, seed);
        var inputs = new double[evaluator.Layout.Symbols.Count];
        var worst = 0.0;
        for (var n = 0; n < states; n++)
        {
            var state = generator.Next();
            foreach (var report in evaluator.Reports.Where(r => r.Quantities.Contains(Quantity.Relative)))
            {
                var values = new double[report.Width];
                evaluator.Evaluate(report, state, inputs, values);
                if (!values.All(double.IsFinite))
                {
                    continue;
                }

                var acceleration = Vector(report, values, Quantity.Acceleration);
                var sum = QuantityInfo.Terms.Select(q => Vector(report, values, q)).Aggregate(Vec3.Zero, (a, b) => a + b);
                var scale = QuantityInfo.Terms.Append(Quantity.Acceleration).Max(q => Vector(report, values, q).Norm);
                worst = Math.Max(worst, (sum - acceleration).Norm / Math.Max(scale, 1e-12));
            }
        }

        return worst;
    }

    private static Vec3 Vector(CompiledReport report, double[] values, Quantity quantity)
    {
        var i = report.Quantities.ToList().IndexOf(quantity);
        return new Vec3(values[3 * i], values[(3 * i) + 1], values[(3 * i) + 2]);
    }
}
