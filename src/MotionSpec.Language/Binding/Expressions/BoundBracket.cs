using MotionSpec.Language.Binding.Symbols;
using MotionSpec.Language.Text;

namespace MotionSpec.Language.Binding.Expressions;

/// <summary><c>[s, 0, h]</c> or <c>[1, 0, 0] in boom</c>: three scalar components in a frame's basis.</summary>
public sealed class BoundBracket(TextSpan span, Dimension dimension, FrameSymbol basis, BoundExpr x, BoundExpr y, BoundExpr z)
    : BoundExpr(span, dimension, true)
{
    /// <summary>The basis: written with <c>in</c>, else the basis of the statement.</summary>
    public FrameSymbol Basis { get; } = basis;

    /// <summary>Component along Basis.x.</summary>
    public BoundExpr X { get; } = x;

    /// <summary>Component along Basis.y.</summary>
    public BoundExpr Y { get; } = y;

    /// <summary>Component along Basis.z.</summary>
    public BoundExpr Z { get; } = z;

    /// <summary>Whether <c>in F</c> was written (else the statement's basis was taken).</summary>
    public bool BasisWritten { get; init; }
}
