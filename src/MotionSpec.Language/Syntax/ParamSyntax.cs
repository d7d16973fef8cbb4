using MotionSpec.Language.Text;

namespace MotionSpec.Language.Syntax;

/// <summary><c>param L = 18 m</c>.</summary>
internal sealed class ParamSyntax(TextSpan span, IdentifierSyntax name, ExpressionSyntax definition) : StatementSyntax(span)
{
    /// <summary>The declared name.</summary>
    public IdentifierSyntax Name { get; } = name;

    /// <summary>The definition.</summary>
    public ExpressionSyntax Definition { get; } = definition;

    /// <inheritdoc/>
    public override string ToString() => "param " + Name + " = " + Definition;
}
