using MotionSpec.Language.Text;

namespace MotionSpec.Language.Diagnostics;

/// <summary>
/// One finding about a spec: a code such as <c>MOT2203</c>, its severity, where it starts and ends, and a
/// message in an engineer's words. A suggestion (a close declared name, say) is already part of the message
/// and is kept apart too for tools that offer fixes.
/// </summary>
public sealed record Diagnostic(string Code, DiagnosticSeverity Severity, TextSpan Span, string Message, string? Suggestion = null)
{
    /// <summary>True when this is an error rather than a warning.</summary>
    public bool IsError => Severity == DiagnosticSeverity.Error;
}
