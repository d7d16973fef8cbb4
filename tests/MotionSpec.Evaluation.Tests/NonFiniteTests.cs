using MotionSpec.Evaluation.ClosedForm;
using MotionSpec.Evaluation.Inputs;
using MotionSpec.Evaluation.Sweeps;
using MotionSpec.Evaluation.Tests.Support;
using MotionSpec.Language.Diagnostics;

namespace MotionSpec.Evaluation.Tests;

public sealed class NonFiniteTests
{
    private const string Singular = "param L = 1 m\n" +
        "coord q : angle\n" +
        "frame base\n" +
        "point p in base at [L / q, 0, 0]\n" +
        "  report p in base\n" +
        "report base in base\n";

    [Fact]
    public void ZeroDenominatorIsAMot5ErrorAtTheReportNamingReportTimeAndQuantity()
    {
        var checkedSpec = Specs.Check(Singular);
        var model = checkedSpec.Model!;
        SettingParser.TryParse(model.Spec, ["q=-1", "q'=1"], out var inputs, out _);
        var diagnostics = new DiagnosticBag();
        var run = ModelEvaluator.Compile(model).Prepare(inputs, new TimeSamples(-1, 0.5, 5), model.Spec.Reports, diagnostics)!;

        Assert.False(run.CheckFinite(diagnostics));
        var error = Assert.Single(diagnostics.Items);
        Assert.Equal("MOT5001", error.Code);
        Assert.True(error.IsError);
        var start = checkedSpec.Source!.GetLinePosition(error.Span.Start);
        Assert.Equal((5, 3), (start.Line, start.Column));
        Assert.Contains("'pInBase'", error.Message, StringComparison.Ordinal);

        // q(t) = q + q'(t - START) with q = -1, q' = 1 and START = -1 s is zero at t = 0 s, the third sample.
        Assert.Contains("t = 0 s", error.Message, StringComparison.Ordinal);
        Assert.Contains("position", error.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void FiniteEverywhereReportsNothing()
    {
        var model = Specs.Model(Singular);
        var diagnostics = new DiagnosticBag();
        SettingParser.TryParse(model.Spec, ["q=0.5"], out var inputs, out _);
        var run = ModelEvaluator.Compile(model).Prepare(inputs, new TimeSamples(0, 0.1, 11), model.Spec.Reports, diagnostics)!;
        Assert.True(run.CheckFinite(diagnostics));
        Assert.Empty(diagnostics.Items);
    }

    [Fact]
    public void DerivedParamThatIsNotFiniteIsAMot5ErrorAtTheParam()
    {
        var checkedSpec = Specs.Check("param w = 2 rad/s\nparam T = 1 / w\nframe f\nreport f in f\n");
        var model = checkedSpec.Model!;
        Assert.True(SettingParser.TryParse(model.Spec, ["w=0"], out var inputs, out _));
        var diagnostics = new DiagnosticBag();
        Assert.Null(ModelEvaluator.Compile(model).Prepare(inputs, TimeSamples.Default, model.Spec.Reports, diagnostics));
        var error = Assert.Single(diagnostics.Items);
        Assert.Equal("MOT5002", error.Code);
        Assert.Equal(2, checkedSpec.Source!.GetLinePosition(error.Span.Start).Line);
        Assert.Contains("'T'", error.Message, StringComparison.Ordinal);
    }
}
