using MotionSpec.Language.Text;

namespace MotionSpec.Language.Syntax;

/// <summary><c>origin at [s, 0, h]</c>: where a frame's origin is, in its parent's basis.</summary>
internal sealed class OriginSyntax(TextSpan span, ExpressionSyntax position) : FrameItemSyntax(span)
{
    /// <summary>The position vector.</summary>
    public ExpressionSyntax Position { get; } = position;

    /// <inheritdoc/>
    public override string ToString() => "origin at " + Position;
}
