using MotionSpec.Compiler;
using MotionSpec.Evaluation.ClosedForm;
using MotionSpec.Evaluation.Inputs;
using MotionSpec.Evaluation.Sweeps;
using MotionSpec.Kinematics;
using MotionSpec.Language.Diagnostics;

namespace MotionSpec.Evaluation.Tests.Support;

/// <summary>Compiles spec text and evaluates reports the way <c>eval</c> does.</summary>
internal static class Specs
{
    public static CheckedSpec Check(string text, string path = "test.motion")
    {
        var checkedSpec = SpecCompiler.Check(path, text);
        Assert.True(
            !checkedSpec.HasErrors,
            "spec has errors:\n" + string.Join("\n", checkedSpec.Diagnostics.Select(d => $"{d.Code} {d.Message}")));
        return checkedSpec;
    }

    public static KinematicModel Model(string text) => Check(text).Model!;

    /// <summary>One report at one instant: quantity key to its three components.</summary>
    public static Dictionary<string, double[]> At(string text, string report, double t, params string[] settings) =>
        At(Model(text), report, t, settings);

    public static Dictionary<string, double[]> At(KinematicModel model, string report, double t, params string[] settings)
    {
        var run = Run(model, new TimeSamples(t, 0, 1), settings, [report]);
        var values = new double[run.MaxWidth];
        run.Evaluate(0, 0, values);
        var motion = run.Reports[0];
        return motion.Quantities
            .Select((q, i) => (QuantityInfo.Key(q), new[] { values[3 * i], values[(3 * i) + 1], values[(3 * i) + 2] }))
            .ToDictionary(p => p.Item1, p => p.Item2);
    }

    public static EvaluationRun Run(KinematicModel model, TimeSamples samples, string[] settings, string[]? reports = null)
    {
        Assert.True(SettingParser.TryParse(model.Spec, settings, out var inputs, out var errors), string.Join("\n", errors));
        var chosen = reports is null ? model.Spec.Reports : model.Spec.Reports.Where(r => reports.Contains(r.Name)).ToList();
        Assert.Equal(reports?.Length ?? chosen.Count, chosen.Count);
        var diagnostics = new DiagnosticBag();
        var run = ModelEvaluator.Compile(model).Prepare(inputs, samples, chosen, diagnostics);
        Assert.NotNull(run);
        return run;
    }

    /// <summary>Asserts |actual - expected| within a relative tolerance of the expected value's scale.</summary>
    public static void Near(double expected, double actual, double relative, double floor = 1e-12)
    {
        var tolerance = Math.Max(Math.Abs(expected) * relative, floor);
        Assert.True(Math.Abs(actual - expected) <= tolerance, $"expected {expected:R}, got {actual:R} (tolerance {tolerance:R})");
    }

    public static void Near(double[] expected, double[] actual, double relative, double floor = 1e-12)
    {
        Assert.Equal(expected.Length, actual.Length);
        for (var i = 0; i < expected.Length; i++)
        {
            Near(expected[i], actual[i], relative, floor);
        }
    }
}
