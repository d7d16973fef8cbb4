using MotionSpec.Language.Text;

namespace MotionSpec.Language.Binding.Expressions;

/// <summary><c>sin(yaw)</c>, <c>atan2(y, x)</c>: a scalar function call.</summary>
public sealed class BoundCall(TextSpan span, Dimension dimension, BoundFunction function, IReadOnlyList<BoundExpr> arguments)
    : BoundExpr(span, dimension, false)
{
    /// <summary>The function.</summary>
    public BoundFunction Function { get; } = function;

    /// <summary>One argument, or two for atan2 (y then x).</summary>
    public IReadOnlyList<BoundExpr> Arguments { get; } = arguments;
}
