namespace MotionSpec.Plotting;

/// <summary>One line of a plot: its legend text, its colour (<c>#RRGGBB</c>) and one value per sample time.</summary>
public sealed record PlotCurve(string Label, string ColorHex, IReadOnlyList<double> Values);
