using MotionSpec.Language.Text;

namespace MotionSpec.Language.Syntax;

/// <summary><c>point tip in hook at [0, 0, -L/3]</c>.</summary>
internal sealed class PointSyntax(TextSpan span, IdentifierSyntax name, IdentifierSyntax frame, ExpressionSyntax position) : StatementSyntax(span)
{
    /// <summary>The declared name.</summary>
    public IdentifierSyntax Name { get; } = name;

    /// <summary>The frame the point is in.</summary>
    public IdentifierSyntax Frame { get; } = frame;

    /// <summary>The position relative to the frame's origin.</summary>
    public ExpressionSyntax Position { get; } = position;

    /// <inheritdoc/>
    public override string ToString() => "point " + Name + " in " + Frame + " at " + Position;
}
