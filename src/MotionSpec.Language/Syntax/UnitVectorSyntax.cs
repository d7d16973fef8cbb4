using MotionSpec.Language.Text;

namespace MotionSpec.Language.Syntax;

/// <summary><c>boom.x</c>: a unit vector of a frame.</summary>
internal sealed class UnitVectorSyntax(TextSpan span, IdentifierSyntax frame, IdentifierSyntax axis) : ExpressionSyntax(span)
{
    /// <summary>The frame.</summary>
    public IdentifierSyntax Frame { get; } = frame;

    /// <summary>x, y or z.</summary>
    public IdentifierSyntax Axis { get; } = axis;

    /// <inheritdoc/>
    public override string ToString() => Frame + "." + Axis;
}
