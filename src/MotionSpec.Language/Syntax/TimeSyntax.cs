using MotionSpec.Language.Text;

namespace MotionSpec.Language.Syntax;

/// <summary><c>t</c>: time.</summary>
internal sealed class TimeSyntax(TextSpan span) : ExpressionSyntax(span)
{
    /// <inheritdoc/>
    public override string ToString() => "t";
}
