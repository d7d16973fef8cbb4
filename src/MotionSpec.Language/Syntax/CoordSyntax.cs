using MotionSpec.Language.Binding;
using MotionSpec.Language.Text;

namespace MotionSpec.Language.Syntax;

/// <summary><c>coord psi : angle</c> or <c>coord s : length</c>.</summary>
internal sealed class CoordSyntax(TextSpan span, IdentifierSyntax name, CoordKind kind) : StatementSyntax(span)
{
    /// <summary>The declared name.</summary>
    public IdentifierSyntax Name { get; } = name;

    /// <summary>Angle or length.</summary>
    public CoordKind Kind { get; } = kind;

    /// <inheritdoc/>
    public override string ToString() => "coord " + Name + " : " + (Kind == CoordKind.Angle ? "angle" : "length");
}
