using MotionSpec.Language.Text;

namespace MotionSpec.Language.Syntax;

/// <summary>A whole spec file: its statements in order (those that parsed).</summary>
internal sealed class SpecSyntax(TextSpan span, IReadOnlyList<StatementSyntax> statements) : SyntaxNode(span)
{
    /// <summary>The statements in file order.</summary>
    public IReadOnlyList<StatementSyntax> Statements { get; } = statements;

    /// <inheritdoc/>
    public override string ToString() => string.Join("\n", Statements) + (Statements.Count > 0 ? "\n" : string.Empty);
}
