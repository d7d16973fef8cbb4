using MotionSpec.Language.Binding.Symbols;
using MotionSpec.Language.Text;

namespace MotionSpec.Language.Binding.Expressions;

/// <summary><c>yaw</c> where yaw is a let: stands for its definition.</summary>
public sealed class BoundLetReference(TextSpan span, LetSymbol let) : BoundExpr(span, let.Dimension, false)
{
    /// <summary>The let named.</summary>
    public LetSymbol Let { get; } = let;
}
