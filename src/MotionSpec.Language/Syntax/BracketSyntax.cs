using MotionSpec.Language.Text;

namespace MotionSpec.Language.Syntax;

/// <summary><c>[s, 0, h]</c> or <c>[1, 0, 0] in boom</c>: a vector by its three components.</summary>
internal sealed class BracketSyntax(TextSpan span, IReadOnlyList<ExpressionSyntax> components, IdentifierSyntax? basis) : ExpressionSyntax(span)
{
    /// <summary>The components as written (the parser requires three).</summary>
    public IReadOnlyList<ExpressionSyntax> Components { get; } = components;

    /// <summary>The frame after <c>in</c>, when written.</summary>
    public IdentifierSyntax? Basis { get; } = basis;

    /// <inheritdoc/>
    public override string ToString() =>
        "[" + string.Join(", ", Components) + "]" + (Basis is null ? string.Empty : " in " + Basis);
}
