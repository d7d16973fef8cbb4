using MotionSpec.Language.Text;

namespace MotionSpec.Language.Binding.Expressions;

/// <summary><c>a + b</c>, <c>s * boom.x</c>, <c>L / 6</c>: arithmetic on scalars and vectors.</summary>
public sealed class BoundBinary(TextSpan span, Dimension dimension, BoundBinaryOperator op, BoundExpr left, BoundExpr right)
    : BoundExpr(span, dimension, left.IsVector || right.IsVector)
{
    /// <summary>The operator.</summary>
    public BoundBinaryOperator Operator { get; } = op;

    /// <summary>The left operand.</summary>
    public BoundExpr Left { get; } = left;

    /// <summary>The right operand.</summary>
    public BoundExpr Right { get; } = right;
}
