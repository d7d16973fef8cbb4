namespace MotionSpec.CSharp.Analysis;

/// <summary>One thing wrong with a generated file, where it is in that file (line and column from 1).</summary>
/// <param name="Code">A MOT51xx code from <see cref="CSharpDiagnosticCodes"/>.</param>
/// <param name="Line">Line in the generated file.</param>
/// <param name="Column">Column in the generated file.</param>
/// <param name="Message">What was found.</param>
public sealed record EmittedCodeFinding(string Code, int Line, int Column, string Message)
{
    /// <summary>The finding as one sentence naming its place: "line 12, column 5 of the generated C#: ...".</summary>
    public override string ToString() =>
        FormattableString.Invariant($"{Message} (line {Line}, column {Column} of the generated C#; this is a defect of MotionSpec, please report it)");
}
