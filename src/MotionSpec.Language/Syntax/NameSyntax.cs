using MotionSpec.Language.Text;

namespace MotionSpec.Language.Syntax;

/// <summary><c>psi</c>, <c>psi'</c>, <c>psi''</c>: a param, coord or let, with its marks.</summary>
internal sealed class NameSyntax(TextSpan span, string name, int marks) : ExpressionSyntax(span)
{
    /// <summary>The name.</summary>
    public string Name { get; } = name;

    /// <summary>How many marks follow (0, 1 or 2).</summary>
    public int Marks { get; } = marks;

    /// <inheritdoc/>
    public override string ToString() => Name + new string('\'', Marks);
}
