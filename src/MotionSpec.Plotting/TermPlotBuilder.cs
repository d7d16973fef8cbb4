namespace MotionSpec.Plotting;

/// <summary>Turns sampled term vectors into the curves of a term plot (magnitudes, and the total's components).</summary>
public static class TermPlotBuilder
{
    /// <summary>
    /// Builds the plot data. <paramref name="termLabels"/> holds the five terms' names in the order of
    /// <see cref="TermSample.Terms"/>; <paramref name="totalLabel"/> names the total; a non-null
    /// <paramref name="basisName"/> adds the second panel with the total's components in that basis.
    /// </summary>
    public static TermPlotData Build(
        string title,
        string subtitle,
        IReadOnlyList<string> termLabels,
        string totalLabel,
        IReadOnlyList<TermSample> samples,
        string? basisName)
    {
        ArgumentNullException.ThrowIfNull(termLabels);
        ArgumentNullException.ThrowIfNull(samples);
        var times = samples.Select(s => s.Time).ToArray();
        var magnitudes = new List<PlotCurve>();
        for (var term = 0; term < termLabels.Count; term++)
        {
            var index = term;
            magnitudes.Add(new PlotCurve(
                termLabels[term],
                TermCurveStyle.TermColors[term % TermCurveStyle.TermColors.Count],
                samples.Select(s => s.Terms[index].Magnitude).ToArray()));
        }

        magnitudes.Add(new PlotCurve(totalLabel, TermCurveStyle.TotalColor, samples.Select(s => s.Total.Magnitude).ToArray()));

        List<PlotCurve>? components = null;
        if (basisName is not null)
        {
            components = [];
            string[] axes = ["x", "y", "z"];
            for (var axis = 0; axis < 3; axis++)
            {
                var index = axis;
                components.Add(new PlotCurve(
                    $"{totalLabel}, {basisName}.{axes[axis]} component",
                    TermCurveStyle.ComponentColors[axis],
                    samples.Select(s => s.Total[index]).ToArray()));
            }
        }

        return new TermPlotData(title, subtitle, times, magnitudes, components, basisName);
    }
}
