using MotionSpec.Language.Text;

namespace MotionSpec.Language.Binding.Expressions;

/// <summary><c>cross(u, v)</c>: the vector product.</summary>
public sealed class BoundCross(TextSpan span, Dimension dimension, BoundExpr left, BoundExpr right) : BoundExpr(span, dimension, true)
{
    /// <summary>The first factor.</summary>
    public BoundExpr Left { get; } = left;

    /// <summary>The second factor.</summary>
    public BoundExpr Right { get; } = right;
}
