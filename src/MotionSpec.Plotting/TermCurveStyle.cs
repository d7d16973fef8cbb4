namespace MotionSpec.Plotting;

/// <summary>
/// Fixed colours for the curves, so that a reader learns them once and a test can look for them in the
/// pixels of a PNG. The palette is the common ten-colour one of plotting tools, with black for the total.
/// </summary>
public static class TermCurveStyle
{
    /// <summary>Colours of relative, centripetal, angular-acceleration, Coriolis and origin terms, in that order.</summary>
    public static IReadOnlyList<string> TermColors { get; } = ["#1F77B4", "#FF7F0E", "#2CA02C", "#D62728", "#9467BD"];

    /// <summary>Colour of the total acceleration.</summary>
    public static string TotalColor => "#000000";

    /// <summary>Colours of the x, y and z components on the second panel.</summary>
    public static IReadOnlyList<string> ComponentColors { get; } = ["#E377C2", "#17BECF", "#8C564B"];
}
