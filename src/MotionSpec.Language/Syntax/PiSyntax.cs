using MotionSpec.Language.Text;

namespace MotionSpec.Language.Syntax;

/// <summary><c>pi</c>.</summary>
internal sealed class PiSyntax(TextSpan span) : ExpressionSyntax(span)
{
    /// <inheritdoc/>
    public override string ToString() => "pi";
}
