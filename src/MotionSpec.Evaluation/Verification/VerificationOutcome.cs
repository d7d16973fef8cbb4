namespace MotionSpec.Evaluation.Verification;

/// <summary>The result of <see cref="Verifier.Run"/>: one entry per report in file order.</summary>
public sealed record VerificationOutcome(IReadOnlyList<ReportVerification> Reports, double Tolerance)
{
    /// <summary>True when every report passed.</summary>
    public bool Passed => Reports.All(r => r.Passed(Tolerance));
}
