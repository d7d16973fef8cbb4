using MotionSpec.Language.Text;

namespace MotionSpec.Language.Binding.Symbols;

/// <summary><c>coord psi : angle</c>: a generalized coordinate whose value, rate and acceleration are inputs.</summary>
public sealed class CoordSymbol(string name, TextSpan nameSpan, TextSpan statementSpan, int index, CoordKind kind)
    : Symbol(name, nameSpan, statementSpan)
{
    /// <summary>Position among the coords, in file order.</summary>
    public int Index { get; } = index;

    /// <summary>Angle or length.</summary>
    public CoordKind Kind { get; } = kind;

    /// <summary>(0,0) for an angle, (1,0) for a length.</summary>
    public Dimension Dimension => Kind == CoordKind.Angle ? Dimension.Dimensionless : Dimension.LengthDimension;

    /// <inheritdoc/>
    public override string KindName => "coord";
}
