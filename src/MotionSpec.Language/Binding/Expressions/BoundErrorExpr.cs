using MotionSpec.Language.Text;

namespace MotionSpec.Language.Binding.Expressions;

/// <summary>
/// Stands in for an expression that already has an error, so that no second error is reported about it.
/// Appears only in specs with errors, which no later stage reads.
/// </summary>
internal sealed class BoundErrorExpr(TextSpan span, bool isVector) : BoundExpr(span, Dimension.Free, isVector);
