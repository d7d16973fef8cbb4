using MotionSpec.Derivation.Tests.Support;
using MotionSpec.Evaluation.ClosedForm;
using MotionSpec.Evaluation.Inputs;
using MotionSpec.Evaluation.Sweeps;
using MotionSpec.Language.Diagnostics;
using MotionSpec.Plotting;
using SkiaSharp;

namespace MotionSpec.Derivation.Tests.Plotting;

/// <summary>From a spec to the image: sampling through the evaluation stage, then rendering.</summary>
public class SpecPlotTests
{
    private static TermPlotData Sweep(string spec, string report, string time, params string[] settings)
    {
        var model = Specs.Model(spec);
        Assert.True(TimeSampleParser.TryParse(time, out var samples, out var timeError), timeError);
        Assert.True(SettingParser.TryParse(model.Spec, settings, out var inputs, out var errors), string.Join("; ", errors));
        var bag = new DiagnosticBag();
        var run = ModelEvaluator.Compile(model).Prepare(inputs, samples, [model.Reports.Single(r => r.Name == report).Report], bag);
        Assert.NotNull(run);
        Assert.True(run.CheckFinite(bag));
        return TermSweepSampler.Sample(model.Spec.Title!, run);
    }

    [Fact]
    public void Turntable_sweep_has_the_disc_magnitudes_at_every_sample()
    {
        var data = Sweep(Specs.Turntable, "spotInGroundBasisDisc", "0:0.1:2", "theta'=2", "theta''=0.5");
        Assert.Equal(21, data.Times.Count);
        Assert.Equal(["relative acceleration", "centripetal acceleration", "angular-acceleration term", "Coriolis acceleration", "acceleration of the moving frame's origin", "total acceleration"], data.Magnitudes.Select(m => m.Label));
        for (var i = 0; i < data.Times.Count; i++)
        {
            // Common practice: a point at radius R on a disc turning at w with angular acceleration alpha has
            // centripetal w^2 R and tangential alpha R; here w = 2 + 0.5 t rad/s, alpha = 0.5 rad/s^2, R = 0.4 m.
            var w = 2 + (0.5 * data.Times[i]);
            Assert.Equal(w * w * 0.4, data.Magnitudes[1].Values[i], 12);
            Assert.Equal(0.5 * 0.4, data.Magnitudes[2].Values[i], 12);
            Assert.Equal(Math.Sqrt(Math.Pow(w * w * 0.4, 2) + Math.Pow(0.2, 2)), data.Magnitudes[5].Values[i], 12);
            Assert.Equal(0, data.Magnitudes[3].Values[i]);
            Assert.Equal(-w * w * 0.4, data.Components![0].Values[i], 12);
        }
    }

    [Fact]
    public void Same_spec_gives_the_same_svg_bytes()
    {
        var first = TermPlotRenderer.Render(Sweep(Specs.SliderOnRod, "sliderInGroundViaRodBasisRod", "0:50ms:3s", "theta'=1.5", "r=0.2", "r'=0.3"), PlotImageFormat.Svg);
        var second = TermPlotRenderer.Render(Sweep(Specs.SliderOnRod, "sliderInGroundViaRodBasisRod", "0:50ms:3s", "theta'=1.5", "r=0.2", "r'=0.3"), PlotImageFormat.Svg);
        Assert.Equal(first, second);
        Assert.Contains("Slider on a turning rod", System.Text.Encoding.UTF8.GetString(first), StringComparison.Ordinal);
    }

    [Fact]
    public void The_image_carries_the_safety_caution_of_the_tables()
    {
        var svg = System.Text.Encoding.UTF8.GetString(TermPlotRenderer.Render(
            Sweep(Specs.SliderOnRod, "sliderInGroundViaRodBasisRod", "0:50ms:3s", "theta'=1.5", "r=0.2", "r'=0.3"), PlotImageFormat.Svg));

        // The two lines together are the whole caution, and each is drawn as text in the image.
        Assert.Equal(MotionSpec.Evaluation.Output.TableWriter.Caution, string.Join(" ", TermPlotRenderer.CautionLines));
        Assert.Equal(2, TermPlotRenderer.CautionLines.Count);
        foreach (var line in TermPlotRenderer.CautionLines)
        {
            Assert.Contains(System.Security.SecurityElement.Escape(line), svg, StringComparison.Ordinal);
        }
    }

    [Fact]
    public void Png_of_a_spec_shows_the_centripetal_and_coriolis_curves_and_the_components()
    {
        var png = TermPlotRenderer.Render(Sweep(Specs.SliderOnRod, "sliderInGroundViaRodBasisRod", "0:50ms:3s", "theta'=1.5", "r=0.2", "r'=0.3"), PlotImageFormat.Png);
        using var bitmap = SKBitmap.Decode(png);
        Assert.Equal(TermPlotRenderer.Width, bitmap.Width);
        Assert.Equal(2 * TermPlotRenderer.PanelHeight, bitmap.Height);
        var counts = TermPlotRendererTests.CountColours(bitmap);
        // Black is left out: axis text is black too, so it would prove nothing about the total's curve.
        foreach (var hex in new[] { TermCurveStyle.TermColors[1], TermCurveStyle.TermColors[3], TermCurveStyle.ComponentColors[0], TermCurveStyle.ComponentColors[1] })
        {
            Assert.True(counts.GetValueOrDefault(hex) > 100, $"curve colour {hex} has {counts.GetValueOrDefault(hex)} pixels");
        }
    }
}
