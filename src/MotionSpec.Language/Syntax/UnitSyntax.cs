using MotionSpec.Language.Text;

namespace MotionSpec.Language.Syntax;

/// <summary><c>m/s^2</c>: the unit written right after a number.</summary>
internal sealed class UnitSyntax(TextSpan span, string text) : SyntaxNode(span)
{
    /// <summary>The unit as written.</summary>
    public string Text { get; } = text;

    /// <inheritdoc/>
    public override string ToString() => Text;
}
