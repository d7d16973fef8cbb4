using MotionSpec.Language.Binding.Expressions;
using MotionSpec.Language.Text;

namespace MotionSpec.Language.Binding.Symbols;

/// <summary><c>param L = 18 m</c>: a constant; derived when its definition names another param.</summary>
public sealed class ParamSymbol(string name, TextSpan nameSpan, TextSpan statementSpan, int index, BoundExpr definition, double value, bool isDerived)
    : Symbol(name, nameSpan, statementSpan)
{
    /// <summary>Position among the params, in file order.</summary>
    public int Index { get; } = index;

    /// <summary>The definition, with every unit already folded into exact SI constants.</summary>
    public BoundExpr Definition { get; } = definition;

    /// <summary>The dimension of the definition (free when it has no units).</summary>
    public Dimension Dimension => Definition.Dimension;

    /// <summary>The value in SI at the spec's own values of all params.</summary>
    public double Value { get; } = value;

    /// <summary>True when the definition names another param, so it is recomputed and cannot be set.</summary>
    public bool IsDerived { get; } = isDerived;

    /// <inheritdoc/>
    public override string KindName => "param";
}
