using MotionSpec.Language.Text;

namespace MotionSpec.Language.Binding.Expressions;

/// <summary><c>t</c>: time in seconds.</summary>
public sealed class BoundTime(TextSpan span) : BoundExpr(span, Dimension.TimeDimension, false);
