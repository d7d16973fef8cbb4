using MotionSpec.Language.Diagnostics;
using MotionSpec.Language.Text;

namespace MotionSpec.Cli;

/// <summary>
/// Turns a diagnostic's span into the lines and columns people see. The text a diagnostic points into is its
/// own <see cref="Diagnostic.Source"/> when the stage set it (for a file that did not decode, the valid text
/// before the bad byte), else the spec's decoded text.
/// </summary>
internal static class DiagnosticPosition
{
    private static readonly LinePosition FileStart = new(1, 1);

    /// <summary>Start (inclusive) and end (exclusive) of a diagnostic; the file's start when no text is known.</summary>
    public static (LinePosition Start, LinePosition End) Locate(Diagnostic diagnostic, SourceText? specSource)
    {
        var source = diagnostic.Source ?? specSource;
        return source is null
            ? (FileStart, FileStart)
            : (source.GetLinePosition(diagnostic.Span.Start), source.GetLinePosition(diagnostic.Span.End));
    }
}
