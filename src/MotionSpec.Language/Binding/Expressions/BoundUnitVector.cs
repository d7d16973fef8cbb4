using MotionSpec.Language.Binding.Symbols;
using MotionSpec.Language.Text;

namespace MotionSpec.Language.Binding.Expressions;

/// <summary><c>boom.x</c>: a unit vector of a frame, dimensionless.</summary>
public sealed class BoundUnitVector(TextSpan span, FrameSymbol frame, Axis axis) : BoundExpr(span, Dimension.Dimensionless, true)
{
    /// <summary>The frame.</summary>
    public FrameSymbol Frame { get; } = frame;

    /// <summary>Which unit vector.</summary>
    public Axis Axis { get; } = axis;
}
