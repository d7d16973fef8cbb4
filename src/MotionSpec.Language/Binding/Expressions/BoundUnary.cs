using MotionSpec.Language.Text;

namespace MotionSpec.Language.Binding.Expressions;

/// <summary><c>-a</c> for a scalar or a vector.</summary>
public sealed class BoundUnary(TextSpan span, BoundUnaryOperator op, BoundExpr operand)
    : BoundExpr(span, operand.Dimension, operand.IsVector)
{
    /// <summary>The operator.</summary>
    public BoundUnaryOperator Operator { get; } = op;

    /// <summary>The operand.</summary>
    public BoundExpr Operand { get; } = operand;
}
