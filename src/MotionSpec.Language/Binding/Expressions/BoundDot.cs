using MotionSpec.Language.Text;

namespace MotionSpec.Language.Binding.Expressions;

/// <summary><c>dot(u, v)</c>: the scalar product of two vectors.</summary>
public sealed class BoundDot(TextSpan span, Dimension dimension, BoundExpr left, BoundExpr right) : BoundExpr(span, dimension, false)
{
    /// <summary>The first factor.</summary>
    public BoundExpr Left { get; } = left;

    /// <summary>The second factor.</summary>
    public BoundExpr Right { get; } = right;
}
