using MotionSpec.Language.Text;

namespace MotionSpec.Language.Binding.Expressions;

/// <summary><c>2.5</c>, <c>0.6 rpm</c>, <c>pi</c>: an exact constant in SI; free unless a unit was written.</summary>
public sealed class BoundNumber(TextSpan span, Dimension dimension, ExactNumber value) : BoundExpr(span, dimension, false)
{
    /// <summary>The exact value in SI units.</summary>
    public ExactNumber Value { get; } = value;
}
