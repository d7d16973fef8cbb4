using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Text;
using MotionSpecDiagnostic = MotionSpec.Language.Diagnostics.Diagnostic;
using RoslynTextSpan = Microsoft.CodeAnalysis.Text.TextSpan;

namespace MotionSpec.Generator;

/// <summary>A spec diagnostic with its place in the spec file, ready to become a compiler diagnostic.</summary>
internal sealed record SpecDiagnostic(string Code, bool IsError, string Path, RoslynTextSpan Span, LinePositionSpan Lines, string Message)
{
    public static SpecDiagnostic From(string path, string text, MotionSpecDiagnostic diagnostic)
    {
        // The compiler's text of the file drops a byte-order mark, as the spec's source text does, so offsets agree.
        var content = text.Length > 0 && text[0] == '\uFEFF' ? text.Substring(1) : text;
        var start = Math.Max(0, Math.Min(diagnostic.Span.Start, content.Length));
        var end = Math.Max(start, Math.Min(diagnostic.Span.End, content.Length));
        var message = diagnostic.Message;
        return new SpecDiagnostic(diagnostic.Code, diagnostic.IsError, path, RoslynTextSpan.FromBounds(start, end),
            new LinePositionSpan(PositionOf(content, start), PositionOf(content, end)), message);
    }

    public Microsoft.CodeAnalysis.Diagnostic ToRoslyn() =>
        Microsoft.CodeAnalysis.Diagnostic.Create(SpecDiagnosticDescriptors.For(Code, IsError), Location.Create(Path, Span, Lines), Message);

    // Zero-based line and UTF-16 character, the compiler's convention (it shows both plus one).
    private static LinePosition PositionOf(string content, int offset)
    {
        var line = 0;
        var lineStart = 0;
        for (var i = 0; i < offset; i++)
        {
            var c = content[i];
            if (c == '\n' || (c == '\r' && (i + 1 >= content.Length || content[i + 1] != '\n')))
            {
                line++;
                lineStart = i + 1;
            }
        }

        return new LinePosition(line, offset - lineStart);
    }
}
