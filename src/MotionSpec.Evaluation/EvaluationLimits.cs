namespace MotionSpec.Evaluation;

/// <summary>The documented limits of evaluation; a request beyond one is refused with a message naming it.</summary>
public static class EvaluationLimits
{
    /// <summary>The most time samples one <c>--t START:STEP:STOP</c> sweep may have (10^6).</summary>
    public const int MaxSamples = 1_000_000;
}
