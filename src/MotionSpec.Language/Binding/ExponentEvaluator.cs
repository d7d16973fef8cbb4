using System.Numerics;
using MotionSpec.Language.Diagnostics;
using MotionSpec.Language.Syntax;

namespace MotionSpec.Language.Binding;

/// <summary>
/// The exact rational value of the exponent of <c>^</c>, which may use numbers without units, unary minus,
/// parentheses, <c>+ - * /</c> and integer powers, and nothing else.
/// </summary>
internal static class ExponentEvaluator
{
    private const int MaxBits = 4096;

    /// <summary>The value, or null after reporting why there is none.</summary>
    public static ExactNumber? Evaluate(ExpressionSyntax exponent, DiagnosticBag diagnostics)
    {
        var value = Value(exponent, diagnostics);
        if (value is { } v && (BigInteger.Abs(v.Numerator) > Limits.Exponent || v.Denominator > Limits.Exponent))
        {
            diagnostics.Error(LanguageDiagnosticCodes.ExponentTooLarge, exponent.Span,
                $"the exponent {v} is beyond the limit: numerator and denominator at most {Limits.Exponent}");
            return null;
        }

        return value;
    }

    private static ExactNumber? Value(ExpressionSyntax syntax, DiagnosticBag diagnostics)
    {
        switch (syntax)
        {
            case NumberSyntax { Unit: null } number:
                var parsed = ExactNumber.ParseDecimal(number.Text.TrimEnd('.'));
                if (parsed is null)
                {
                    diagnostics.Error(LanguageDiagnosticCodes.ExponentTooLarge, number.Span, $"the exponent {number.Text} is beyond the limit of {Limits.Exponent}");
                }

                return parsed;
            case ParenthesizedSyntax paren:
                return Value(paren.Inner, diagnostics);
            case NegateSyntax negate:
                return Value(negate.Operand, diagnostics)?.Negate();
            case BinarySyntax binary:
                var left = Value(binary.Left, diagnostics);
                var right = Value(binary.Right, diagnostics);
                if (left is not { } l || right is not { } r)
                {
                    return null;
                }

                switch (binary.Operator)
                {
                    case '+':
                        return Checked(ExactNumber.Reduced((l.Numerator * r.Denominator) + (r.Numerator * l.Denominator), l.Denominator * r.Denominator, 0), binary, diagnostics);
                    case '-':
                        return Checked(ExactNumber.Reduced((l.Numerator * r.Denominator) - (r.Numerator * l.Denominator), l.Denominator * r.Denominator, 0), binary, diagnostics);
                    case '*':
                        return Checked(ExactNumber.Multiply(l, r), binary, diagnostics);
                    default:
                        if (r.IsZero)
                        {
                            diagnostics.Error(LanguageDiagnosticCodes.DivisionByZero, binary.Right.Span, "this exponent divides by zero");
                            return null;
                        }

                        return Checked(ExactNumber.Divide(l, r), binary, diagnostics);
                }

            case PowerSyntax power:
                var @base = Value(power.Base, diagnostics);
                var exponent = Value(power.Exponent, diagnostics);
                if (@base is not { } b || exponent is not { } e)
                {
                    return null;
                }

                if (!e.Denominator.IsOne || BigInteger.Abs(e.Numerator) > Limits.Exponent)
                {
                    diagnostics.Error(LanguageDiagnosticCodes.ExponentNotNumbers, power.Exponent.Span,
                        "inside an exponent, powers must be whole numbers (at most " + Limits.Exponent.ToString(System.Globalization.CultureInfo.InvariantCulture) + ") so the exponent stays an exact fraction");
                    return null;
                }

                var n = (int)e.Numerator;
                if (b.IsZero && n < 0)
                {
                    diagnostics.Error(LanguageDiagnosticCodes.DivisionByZero, power.Span, "zero to a negative power divides by zero");
                    return null;
                }

                if ((Bits(b.Numerator) + Bits(b.Denominator)) * (long)Math.Abs(n) > MaxBits)
                {
                    diagnostics.Error(LanguageDiagnosticCodes.ExponentTooLarge, power.Span, "this exponent is too large to compute exactly");
                    return null;
                }

                return b.Pow(n);
            default:
                diagnostics.Error(LanguageDiagnosticCodes.ExponentNotNumbers, syntax.Span,
                    $"the exponent of '^' is made of numbers only (x^2, x^-2, x^(1/2)); '{syntax}' is not a plain number");
                return null;
        }
    }

    private static ExactNumber? Checked(ExactNumber value, SyntaxNode at, DiagnosticBag diagnostics)
    {
        if (Bits(value.Numerator) + Bits(value.Denominator) > MaxBits)
        {
            diagnostics.Error(LanguageDiagnosticCodes.ExponentTooLarge, at.Span, "this exponent is too large to compute exactly");
            return null;
        }

        return value;
    }

    private static long Bits(BigInteger value) => BigInteger.Abs(value).ToByteArray().Length * 8L;
}
