using MotionSpec.Language.Binding.Expressions;
using MotionSpec.Language.Text;

namespace MotionSpec.Language.Binding.Symbols;

/// <summary><c>point tip in hook at [0, 0, -L/3]</c>: a point fixed in a frame or moving along a path in it.</summary>
public sealed class PointSymbol(string name, TextSpan nameSpan, TextSpan statementSpan, int index, FrameSymbol frame, BoundExpr position)
    : Symbol(name, nameSpan, statementSpan)
{
    /// <summary>Position among the points, in file order.</summary>
    public int Index { get; } = index;

    /// <summary>The frame the point is declared in.</summary>
    public FrameSymbol Frame { get; } = frame;

    /// <summary>The position relative to the frame's origin (a vector of length dimension or free).</summary>
    public BoundExpr Position { get; } = position;

    /// <inheritdoc/>
    public override string KindName => "point";
}
