using MotionSpec.Language.Binding.Symbols;
using MotionSpec.Language.Text;

namespace MotionSpec.Language.Binding.Expressions;

/// <summary><c>L</c> where L is a param.</summary>
public sealed class BoundParamReference(TextSpan span, ParamSymbol param) : BoundExpr(span, param.Dimension, false)
{
    /// <summary>The param named.</summary>
    public ParamSymbol Param { get; } = param;
}
