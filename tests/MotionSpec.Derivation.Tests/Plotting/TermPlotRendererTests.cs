using System.Text;
using MotionSpec.Plotting;
using SkiaSharp;

namespace MotionSpec.Derivation.Tests.Plotting;

public class TermPlotRendererTests
{
    private static readonly string[] TermLabels =
        ["relative acceleration", "centripetal acceleration", "angular-acceleration term", "Coriolis acceleration", "acceleration of the moving frame's origin"];

    // A bead sliding out along a rod that turns at a constant rate w, with r = r0 + u t: relative 0,
    // centripetal w^2 r, Coriolis 2 w u, angular and origin 0 (polar-coordinate kinematics, any dynamics textbook).
    internal static TermPlotData BeadOnRod(bool withComponents)
    {
        const double w = 2.0, r0 = 0.5, u = 0.3;
        var samples = new List<TermSample>();
        for (var i = 0; i <= 60; i++)
        {
            var t = i * 0.05;
            var r = r0 + (u * t);
            var centripetal = new PlotVector(-w * w * r, 0, 0);
            var coriolis = new PlotVector(0, 2 * w * u, 0);
            var zero = new PlotVector(0, 0, 0);
            var total = new PlotVector(centripetal.X, coriolis.Y, 0);
            samples.Add(new TermSample(t, [zero, centripetal, zero, coriolis, zero], total));
        }

        return TermPlotBuilder.Build("Bead on a turning rod", "report beadInGround via rod, basis rod", TermLabels, "total acceleration", samples, withComponents ? "rod" : null);
    }

    [Fact]
    public void Magnitudes_are_the_norms_of_the_sampled_vectors()
    {
        var data = BeadOnRod(withComponents: true);
        Assert.Equal(6, data.Magnitudes.Count);
        // centripetal at t = 1: w^2 (r0 + u) = 4 * 0.8
        Assert.Equal(3.2, data.Magnitudes[1].Values[20], 12);
        // total at t = 1: sqrt(3.2^2 + 1.2^2)
        Assert.Equal(Math.Sqrt((3.2 * 3.2) + (1.2 * 1.2)), data.Magnitudes[5].Values[20], 12);
        Assert.Equal(-3.2, data.Components![0].Values[20], 12);
        Assert.Equal(1.2, data.Components[1].Values[20], 12);
    }

    [Fact]
    public void Svg_is_the_same_bytes_every_time()
    {
        var first = TermPlotRenderer.Render(BeadOnRod(withComponents: true), PlotImageFormat.Svg);
        var second = TermPlotRenderer.Render(BeadOnRod(withComponents: true), PlotImageFormat.Svg);
        Assert.Equal(first, second);
        var text = Encoding.UTF8.GetString(first);
        Assert.StartsWith("<?xml", text, StringComparison.Ordinal);
        Assert.Contains("Coriolis acceleration", text, StringComparison.Ordinal);
        Assert.Contains("time t (s)", text, StringComparison.Ordinal);
        Assert.DoesNotContain("cl_", text, StringComparison.Ordinal);
    }

    [Fact]
    public void Png_has_the_documented_size_and_shows_every_nonzero_curve()
    {
        var png = TermPlotRenderer.Render(BeadOnRod(withComponents: true), PlotImageFormat.Png);
        Assert.True(png.Length > 1000);
        Assert.Equal([0x89, (byte)'P', (byte)'N', (byte)'G'], png.Take(4).ToArray());
        using var bitmap = SKBitmap.Decode(png);
        Assert.Equal(TermPlotRenderer.Width, bitmap.Width);
        Assert.Equal(2 * TermPlotRenderer.PanelHeight, bitmap.Height);

        var counts = CountColours(bitmap);
        foreach (var hex in new[] { TermCurveStyle.TermColors[1], TermCurveStyle.TermColors[3], TermCurveStyle.ComponentColors[0], TermCurveStyle.ComponentColors[1] })
        {
            Assert.True(counts.GetValueOrDefault(hex) > 100, $"curve colour {hex} has {counts.GetValueOrDefault(hex)} pixels");
        }
    }

    [Fact]
    public void Extension_chooses_the_format()
    {
        Assert.Equal(PlotImageFormat.Svg, PlotImageFormats.FromPath("out/plot.SVG"));
        Assert.Equal(PlotImageFormat.Png, PlotImageFormats.FromPath("plot.png"));
        Assert.Null(PlotImageFormats.FromPath("plot.pdf"));
        Assert.Null(PlotImageFormats.FromPath("plot"));
    }

    /// <summary>
    /// Pixels of each colour in the data areas only: the upper 80% of each panel, above the legend, so that a
    /// legend swatch alone cannot pass for a drawn curve.
    /// </summary>
    internal static Dictionary<string, int> CountColours(SKBitmap bitmap)
    {
        var counts = new Dictionary<string, int>(StringComparer.Ordinal);
        for (var y = 0; y < bitmap.Height; y++)
        {
            if (y % TermPlotRenderer.PanelHeight >= TermPlotRenderer.PanelHeight * 4 / 5)
            {
                continue;
            }

            for (var x = 0; x < bitmap.Width; x++)
            {
                var c = bitmap.GetPixel(x, y);
                var hex = $"#{c.Red:X2}{c.Green:X2}{c.Blue:X2}";
                counts[hex] = counts.GetValueOrDefault(hex) + 1;
            }
        }

        return counts;
    }
}
