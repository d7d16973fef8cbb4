using MotionSpec.Language.Text;

namespace MotionSpec.Language.Syntax;

/// <summary><c>title "Harbour crane"</c>.</summary>
internal sealed class TitleSyntax(TextSpan span, string text) : StatementSyntax(span)
{
    /// <summary>The title with escapes resolved.</summary>
    public string Text { get; } = text;

    /// <inheritdoc/>
    public override string ToString() => "title \"" + Text.Replace("\\", "\\\\").Replace("\"", "\\\"") + "\"";
}
