using MotionSpec.Language.Text;

namespace MotionSpec.Language.Syntax;

/// <summary><c>sin(yaw)</c>, <c>atan2(y, x)</c>, <c>cross(u, v)</c>: a function call.</summary>
internal sealed class CallSyntax(TextSpan span, IdentifierSyntax function, IReadOnlyList<ExpressionSyntax> arguments) : ExpressionSyntax(span)
{
    /// <summary>The function's name.</summary>
    public IdentifierSyntax Function { get; } = function;

    /// <summary>The arguments in order.</summary>
    public IReadOnlyList<ExpressionSyntax> Arguments { get; } = arguments;

    /// <inheritdoc/>
    public override string ToString() => Function + "(" + string.Join(", ", Arguments) + ")";
}
