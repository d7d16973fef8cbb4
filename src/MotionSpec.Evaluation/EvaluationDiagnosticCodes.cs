namespace MotionSpec.Evaluation;

/// <summary>The MOT5xxx codes of evaluation: values that cannot be computed at the state asked for.</summary>
public static class EvaluationDiagnosticCodes
{
    /// <summary>A report's vector is not finite at a sample (a zero denominator there, say).</summary>
    public const string NotFinite = "MOT5001";

    /// <summary>A derived param is not finite once recomputed from the values set on the command line.</summary>
    public const string ParamNotFinite = "MOT5002";
}
