using MotionSpec.Language.Text;

namespace MotionSpec.Language.Syntax;

/// <summary><c>9.81 m/s^2</c>, <c>.5</c>, <c>2e-3</c>: a number with an optional unit.</summary>
internal sealed class NumberSyntax(TextSpan span, string text, TextSpan numberSpan, UnitSyntax? unit) : ExpressionSyntax(span)
{
    /// <summary>The digits as written.</summary>
    public string Text { get; } = text;

    /// <summary>Where the digits are written.</summary>
    public TextSpan NumberSpan { get; } = numberSpan;

    /// <summary>The unit, when one follows.</summary>
    public UnitSyntax? Unit { get; } = unit;

    /// <inheritdoc/>
    public override string ToString() => Unit is null ? Text : Text + " " + Unit;
}
