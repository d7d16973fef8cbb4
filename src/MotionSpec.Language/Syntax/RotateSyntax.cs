using MotionSpec.Language.Text;

namespace MotionSpec.Language.Syntax;

/// <summary><c>rotate about z by yaw</c> or <c>rotate about [1, 1, 0] by q</c>.</summary>
internal sealed class RotateSyntax(TextSpan span, SyntaxNode axis, ExpressionSyntax angle) : FrameItemSyntax(span)
{
    /// <summary>An <see cref="IdentifierSyntax"/> (x, y or z) or an expression that should be a bracket of numbers.</summary>
    public SyntaxNode Axis { get; } = axis;

    /// <summary>The angle after <c>by</c>.</summary>
    public ExpressionSyntax Angle { get; } = angle;

    /// <inheritdoc/>
    public override string ToString() => "rotate about " + Axis + " by " + Angle;
}
