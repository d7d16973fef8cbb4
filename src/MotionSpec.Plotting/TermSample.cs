namespace MotionSpec.Plotting;

/// <summary>
/// The acceleration of a point at one time, split into the five rotating-frame terms (relative, centripetal,
/// angular-acceleration, Coriolis, origin, in that order), and the total.
/// </summary>
public sealed record TermSample(double Time, IReadOnlyList<PlotVector> Terms, PlotVector Total);
