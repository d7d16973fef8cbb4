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

    /// <summary>
    /// The text the span points into, when the stage that reported it knows it (the front end always sets it;
    /// for a file that could not be decoded it is the valid text before the bad byte).
    /// </summary>
    public SourceText? Source { get; init; }

    /// <summary>The line and column where the diagnostic starts, when <see cref="Source"/> is known.</summary>
    public LinePosition? Start => Source?.GetLinePosition(Span.Start);

    /// <summary>The line and column just past its end, when <see cref="Source"/> is known.</summary>
    public LinePosition? End => Source?.GetLinePosition(Span.End);
}
