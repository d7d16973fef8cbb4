using MotionSpec.Language.Text;

namespace MotionSpec.Language.Syntax;

/// <summary><c>spin [a', b', c']</c>: a frame's angular velocity in its own basis.</summary>
internal sealed class SpinSyntax(TextSpan span, ExpressionSyntax rates) : FrameItemSyntax(span)
{
    /// <summary>The rates (should be a bare bracket).</summary>
    public ExpressionSyntax Rates { get; } = rates;

    /// <inheritdoc/>
    public override string ToString() => "spin " + Rates;
}
