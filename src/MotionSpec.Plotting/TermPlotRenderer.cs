using System.Globalization;
using System.Text;
using ScottPlot;
using SkiaSharp;

namespace MotionSpec.Plotting;

/// <summary>Draws a term plot: magnitudes over time, and optionally the total's components on a second panel.</summary>
public static class TermPlotRenderer
{
    /// <summary>Width of the image in pixels.</summary>
    public const int Width = 1000;

    /// <summary>Height of the magnitude panel in pixels (the component panel adds as much again).</summary>
    public const int PanelHeight = 560;

    // A strip under the panels for the caution, so that an image passed around without its table still carries it.
    private const int FooterHeight = 40;

    /// <summary>Renders the plot as the bytes of an SVG (UTF-8) or PNG file.</summary>
    public static byte[] Render(TermPlotData data, PlotImageFormat format)
    {
        ArgumentNullException.ThrowIfNull(data);

        // ScottPlot writes tick labels in the thread's culture (0,5 under de-DE, with another minus sign under
        // ar-SA); the same data must give the same image on every machine, so it draws in the invariant one.
        var culture = CultureInfo.CurrentCulture;
        CultureInfo.CurrentCulture = CultureInfo.InvariantCulture;
        try
        {
            var multiplot = Compose(data);
            var height = PanelHeight * multiplot.Subplots.Count;
            return format == PlotImageFormat.Svg ? RenderSvg(multiplot, height) : RenderPng(multiplot, height);
        }
        finally
        {
            CultureInfo.CurrentCulture = culture;
        }
    }

    private static Multiplot Compose(TermPlotData data)
    {
        var multiplot = new Multiplot();
        // A new multiplot already holds one plot: it becomes the magnitude panel.
        var magnitudes = multiplot.GetPlot(0);
        Style(magnitudes);
        magnitudes.Title(data.Title + "\n" + data.Subtitle);
        magnitudes.XLabel("time t (s)");
        magnitudes.YLabel("magnitude (m/s²)");
        var times = data.Times.ToArray();
        foreach (var curve in data.Magnitudes)
        {
            AddCurve(magnitudes, times, curve, ReferenceEquals(curve, data.Magnitudes[^1]) ? 2.5f : 1.8f);
        }

        magnitudes.ShowLegend(Edge.Bottom);

        if (data.Components is { } components)
        {
            var parts = multiplot.AddPlot();
            Style(parts);
            parts.XLabel("time t (s)");
            parts.YLabel($"component in basis {data.BasisName} (m/s²)");
            foreach (var curve in components)
            {
                AddCurve(parts, times, curve, 1.8f);
            }

            parts.ShowLegend(Edge.Bottom);
            multiplot.SharedAxes.ShareX([magnitudes, parts]);
        }

        return multiplot;
    }

    private static void Style(Plot plot)
    {
        // DejaVu Sans ships with most Linux systems and has the superscript two of the unit labels; elsewhere the renderer falls back to a font it finds.
        plot.Font.Set("DejaVu Sans");
        plot.FigureBackground.Color = Colors.White;
        plot.DataBackground.Color = Colors.White;
    }

    private static void AddCurve(Plot plot, double[] times, PlotCurve curve, float width)
    {
        var scatter = plot.Add.Scatter(times, curve.Values.ToArray());
        scatter.LegendText = curve.Label;
        scatter.Color = Color.FromHex(curve.ColorHex);
        scatter.LineWidth = width;
        // Markers only help while the samples are few enough to tell apart.
        scatter.MarkerSize = times.Length <= 40 ? 4 : 0;
    }

    private static byte[] RenderSvg(Multiplot multiplot, int height)
    {
        using var stream = new SKDynamicMemoryWStream();
        using (var canvas = SKSvgCanvas.Create(new SKRect(0, 0, Width, height), stream))
        {
            Draw(canvas, multiplot, height);
        }

        using var svg = stream.DetachAsData();
        var text = Encoding.UTF8.GetString(svg.ToArray());
        return Encoding.UTF8.GetBytes(SvgIdentifiers.Renumber(text));
    }

    private static byte[] RenderPng(Multiplot multiplot, int height)
    {
        using var surface = SKSurface.Create(new SKImageInfo(Width, height)) ?? throw new InvalidOperationException("no raster surface");
        Draw(surface.Canvas, multiplot, height);
        using var image = surface.Snapshot();
        using var png = image.Encode(SKEncodedImageFormat.Png, 100);
        return png.ToArray();
    }

    private static void Draw(SKCanvas canvas, Multiplot multiplot, int height)
    {
        canvas.Clear(SKColors.White);
        multiplot.Render(canvas, new PixelRect(0, Width, height - FooterHeight, 0));
        using var typeface = SKTypeface.FromFamilyName("DejaVu Sans");
        using var font = new SKFont(typeface, 12);
        using var paint = new SKPaint { Color = new SKColor(0x33, 0x33, 0x33), IsAntialias = true };
        var line = height - FooterHeight + 15;
        foreach (var text in CautionLines)
        {
            canvas.DrawText(text, 12, line, SKTextAlign.Left, font, paint);
            line += 16;
        }
    }

    /// <summary>The caution of every table, on two lines that fit the width of the image.</summary>
    internal static IReadOnlyList<string> CautionLines { get; } = SplitCaution(Evaluation.Output.TableWriter.Caution);

    private static string[] SplitCaution(string caution)
    {
        var end = caution.IndexOf(". ", StringComparison.Ordinal);
        return end < 0 ? [caution] : [caution[..(end + 1)], caution[(end + 2)..]];
    }
}
