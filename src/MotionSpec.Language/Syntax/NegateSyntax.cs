using MotionSpec.Language.Text;

namespace MotionSpec.Language.Syntax;

/// <summary><c>-x</c>: unary minus.</summary>
internal sealed class NegateSyntax(TextSpan span, ExpressionSyntax operand) : ExpressionSyntax(span)
{
    /// <summary>The negated expression.</summary>
    public ExpressionSyntax Operand { get; } = operand;

    /// <inheritdoc/>
    public override string ToString() => "-" + Operand;
}
