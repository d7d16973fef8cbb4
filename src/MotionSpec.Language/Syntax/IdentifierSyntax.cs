using MotionSpec.Language.Text;

namespace MotionSpec.Language.Syntax;

/// <summary><c>trolley</c>: a name where it is declared or where a frame, point or axis is named.</summary>
internal sealed class IdentifierSyntax(TextSpan span, string text) : SyntaxNode(span)
{
    /// <summary>The name.</summary>
    public string Text { get; } = text;

    /// <inheritdoc/>
    public override string ToString() => Text;
}
