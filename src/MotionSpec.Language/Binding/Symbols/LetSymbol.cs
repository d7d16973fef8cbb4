using MotionSpec.Language.Binding.Expressions;
using MotionSpec.Language.Text;

namespace MotionSpec.Language.Binding.Symbols;

/// <summary><c>let yaw = w * t + psi</c>: a named scalar expression of t, params, coords, marks and earlier lets.</summary>
public sealed class LetSymbol(string name, TextSpan nameSpan, TextSpan statementSpan, BoundExpr definition)
    : Symbol(name, nameSpan, statementSpan)
{
    /// <summary>The definition (it may refer to earlier lets).</summary>
    public BoundExpr Definition { get; } = definition;

    /// <summary>The dimension of the definition.</summary>
    public Dimension Dimension => Definition.Dimension;

    /// <inheritdoc/>
    public override string KindName => "let";
}
