namespace MotionSpec.Plotting;

/// <summary>
/// Everything a term plot shows, already evaluated: sample times, the magnitude of each rotating-frame term
/// and of the total acceleration, and optionally the total's components in the report's basis (second panel).
/// Values are in SI (seconds, m/s^2).
/// </summary>
public sealed class TermPlotData(
    string title,
    string subtitle,
    IReadOnlyList<double> times,
    IReadOnlyList<PlotCurve> magnitudes,
    IReadOnlyList<PlotCurve>? components,
    string? basisName)
{
    /// <summary>The plot's title (the spec's title or file name).</summary>
    public string Title { get; } = title;

    /// <summary>A second line naming the report, observer, moving frame and basis.</summary>
    public string Subtitle { get; } = subtitle;

    /// <summary>Sample times in seconds, increasing.</summary>
    public IReadOnlyList<double> Times { get; } = times;

    /// <summary>The five terms' magnitudes and the total's, one curve each.</summary>
    public IReadOnlyList<PlotCurve> Magnitudes { get; } = magnitudes;

    /// <summary>The total acceleration's components in the report's basis, or null for a single panel.</summary>
    public IReadOnlyList<PlotCurve>? Components { get; } = components;

    /// <summary>The basis the components are written in, shown on the second panel's axis.</summary>
    public string? BasisName { get; } = basisName;
}
