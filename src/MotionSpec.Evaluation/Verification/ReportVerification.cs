using MotionSpec.Kinematics;

namespace MotionSpec.Evaluation.Verification;

/// <summary>
/// How one report's closed forms compared with the numeric path: the worst error over the states compared
/// (|a - b| / max(|b|, S, 1e-12), S the largest norm among the report's vectors of that dimension), the
/// vector and instant where it occurred, and how many states were compared or skipped because the closed
/// form was not finite there.
/// </summary>
public sealed record ReportVerification(
    string Name,
    double WorstError,
    Quantity? WorstQuantity,
    double WorstTime,
    int StatesCompared,
    int StatesSkipped)
{
    /// <summary>True when at least one state was compared and every error is within the tolerance.</summary>
    public bool Passed(double tolerance) => StatesCompared > 0 && WorstError <= tolerance;
}
