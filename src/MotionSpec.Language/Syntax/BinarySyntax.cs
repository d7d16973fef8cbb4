using MotionSpec.Language.Text;

namespace MotionSpec.Language.Syntax;

/// <summary><c>a + b</c>, <c>a - b</c>, <c>a * b</c>, <c>a / b</c>.</summary>
internal sealed class BinarySyntax(TextSpan span, char op, TextSpan operatorSpan, ExpressionSyntax left, ExpressionSyntax right) : ExpressionSyntax(span)
{
    /// <summary>One of <c>+ - * /</c>.</summary>
    public char Operator { get; } = op;

    /// <summary>Where the operator is written.</summary>
    public TextSpan OperatorSpan { get; } = operatorSpan;

    /// <summary>The left operand.</summary>
    public ExpressionSyntax Left { get; } = left;

    /// <summary>The right operand.</summary>
    public ExpressionSyntax Right { get; } = right;

    /// <inheritdoc/>
    public override string ToString() => Left + " " + Operator + " " + Right;
}
