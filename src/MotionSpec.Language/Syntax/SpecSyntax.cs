using MotionSpec.Language.Text;

namespace MotionSpec.Language.Syntax;

/// <summary>A whole spec file: its statements in order (those that parsed).</summary>
internal sealed class SpecSyntax(TextSpan span, IReadOnlyList<StatementSyntax> statements, IReadOnlyList<IdentifierSyntax>? brokenDeclarations = null)
    : SyntaxNode(span)
{
    /// <summary>
    /// Names declared by statements that failed to parse; uses of them are not reported again as unknown.
    /// </summary>
    public IReadOnlyList<IdentifierSyntax> BrokenDeclarations { get; } = brokenDeclarations ?? [];

    /// <summary>The statements in file order.</summary>
    public IReadOnlyList<StatementSyntax> Statements { get; } = statements;

    /// <inheritdoc/>
    public override string ToString() => string.Join("\n", Statements) + (Statements.Count > 0 ? "\n" : string.Empty);
}
