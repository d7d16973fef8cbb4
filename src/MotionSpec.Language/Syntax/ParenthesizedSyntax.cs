using MotionSpec.Language.Text;

namespace MotionSpec.Language.Syntax;

/// <summary><c>(a + b)</c>.</summary>
internal sealed class ParenthesizedSyntax(TextSpan span, ExpressionSyntax inner) : ExpressionSyntax(span)
{
    /// <summary>The expression inside.</summary>
    public ExpressionSyntax Inner { get; } = inner;

    /// <inheritdoc/>
    public override string ToString() => "(" + Inner + ")";
}
