namespace MotionSpec.Evaluation.Sweeps;

/// <summary>
/// The instants of an evaluation: <see cref="Count"/> samples <c>Start + i * Step</c> in seconds. A single
/// instant has a step of 0.
/// </summary>
public readonly record struct TimeSamples(double Start, double Step, int Count)
{
    /// <summary>The single instant t = 0 s, the default.</summary>
    public static TimeSamples Default => new(0, 0, 1);

    /// <summary>The i-th instant.</summary>
    public double At(int index) => Start + (index * Step);
}
