using MotionSpec.Language.Diagnostics;
using MotionSpec.Language.Lexing;
using Superpower.Model;
using TextSpan = MotionSpec.Language.Text.TextSpan;

namespace MotionSpec.Language.Parsing;

/// <summary>
/// Measures a statement's tokens before the recursive parser sees them, so that no input can nest deep enough
/// to exhaust the stack. Each open parenthesis or bracket opens a level; within a level, each unary minus and
/// each <c>^</c> of an unbroken chain adds one more (they recurse in the parser); a binary operator or comma
/// ends the chain. Binary operators are counted against <see cref="Limits.OperatorsPerStatement"/>.
/// </summary>
internal static class NestingGuard
{
    /// <summary>Null when the statement is within the limits, else the error to report.</summary>
    public static (string Code, TextSpan Span, string Message)? Check(Token<MotionToken>[] tokens, int start, int count)
    {
        var levels = new Stack<int>();
        var chain = 0;
        var depth = 0;
        var operators = 0;
        var previous = (MotionToken?)null;
        for (var i = start; i < start + count; i++)
        {
            var token = tokens[i];
            switch (token.Kind)
            {
                case MotionToken.LeftParen:
                case MotionToken.LeftBracket:
                    levels.Push(chain);
                    depth += chain + 1;
                    chain = 0;
                    break;
                case MotionToken.RightParen:
                case MotionToken.RightBracket:
                    if (levels.Count > 0)
                    {
                        chain = levels.Pop();
                        depth -= chain + 1;
                    }

                    break;
                case MotionToken.Minus when previous is null || !EndsOperand(previous.Value):
                case MotionToken.Caret:
                    chain++;
                    break;
                case MotionToken.Plus:
                case MotionToken.Minus:
                case MotionToken.Star:
                case MotionToken.Slash:
                    operators++;
                    chain = 0;
                    break;
                case MotionToken.Comma:
                    chain = 0;
                    break;
            }

            if (depth + chain > Limits.ExpressionNesting)
            {
                return (LanguageDiagnosticCodes.NestingTooDeep, Span(token),
                    $"this expression is nested more than {Limits.ExpressionNesting} levels deep (parentheses, brackets, calls, unary minus and ^ chains each count); the limit is {Limits.ExpressionNesting}");
            }

            if (operators > Limits.OperatorsPerStatement)
            {
                return (LanguageDiagnosticCodes.StatementTooLong, Span(token),
                    $"this statement has more than {Limits.OperatorsPerStatement} operators; the limit is {Limits.OperatorsPerStatement}: split it with let");
            }

            previous = token.Kind;
        }

        return null;
    }

    private static bool EndsOperand(MotionToken kind) => kind is MotionToken.Number or MotionToken.Unit or MotionToken.Identifier
        or MotionToken.Mark or MotionToken.Time or MotionToken.Pi or MotionToken.RightParen or MotionToken.RightBracket;

    private static TextSpan Span(Token<MotionToken> token) => new(token.Span.Position.Absolute, token.Span.Length);
}
