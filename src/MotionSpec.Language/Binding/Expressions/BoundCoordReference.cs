using MotionSpec.Language.Binding.Symbols;
using MotionSpec.Language.Text;

namespace MotionSpec.Language.Binding.Expressions;

/// <summary><c>psi</c>, <c>psi'</c>, <c>psi''</c>: a coord or one of its first two time derivatives.</summary>
public sealed class BoundCoordReference(TextSpan span, CoordSymbol coord, int marks)
    : BoundExpr(span, Dimension.Of(coord.Dimension.Length, coord.Dimension.Time - marks), false)
{
    /// <summary>The coord named.</summary>
    public CoordSymbol Coord { get; } = coord;

    /// <summary>0, 1 or 2: how many marks follow the name.</summary>
    public int Marks { get; } = marks;
}
