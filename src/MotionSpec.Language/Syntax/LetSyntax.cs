using MotionSpec.Language.Text;

namespace MotionSpec.Language.Syntax;

/// <summary><c>let yaw = w * t + psi</c>.</summary>
internal sealed class LetSyntax(TextSpan span, IdentifierSyntax name, ExpressionSyntax definition) : StatementSyntax(span)
{
    /// <summary>The declared name.</summary>
    public IdentifierSyntax Name { get; } = name;

    /// <summary>The definition.</summary>
    public ExpressionSyntax Definition { get; } = definition;

    /// <inheritdoc/>
    public override string ToString() => "let " + Name + " = " + Definition;
}
