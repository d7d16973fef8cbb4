using MotionSpec.Language.Diagnostics;
using MotionSpec.Language.Units;
using Superpower;
using Superpower.Model;
using SpanOfText = Superpower.Model.TextSpan;

namespace MotionSpec.Language.Lexing;

/// <summary>
/// Turns spec text into tokens. It never stops at an error: a bad character or literal is recorded in
/// <see cref="Errors"/> and skipped (or kept as the nearest token) so the parser still sees every statement.
/// Units are lexed here because they depend on what precedes them: a word right after a number (and
/// optional white space) that is a unit atom starts a unit.
/// </summary>
internal sealed class MotionTokenizer : Tokenizer<MotionToken>
{
    private readonly List<LexicalError> _errors = [];

    /// <summary>The problems found by the last run, in text order.</summary>
    public IReadOnlyList<LexicalError> Errors => _errors;

    /// <inheritdoc/>
    protected override IEnumerable<Result<MotionToken>> Tokenize(SpanOfText span)
    {
        var text = span.Source!;
        var position = span.Position.Absolute;
        var end = position + span.Length;
        var cursor = span;
        var badRunStart = -1;

        while (position < end)
        {
            var c = text[position];
            var start = position;
            MotionToken? kind = null;

            if (c == ' ' || c == '\t' || c == '\r' || c == '\n')
            {
                position++;
            }
            else if (c == '#')
            {
                while (position < end && text[position] != '\n' && text[position] != '\r')
                {
                    position++;
                }
            }
            else if (UnitText.IsDigit(c) || (c == '.' && position + 1 < end && UnitText.IsDigit(text[position + 1])))
            {
                position = LexNumber(text, position, end);
                kind = MotionToken.Number;
            }
            else if (UnitText.IsNameStart(c))
            {
                position += UnitText.NameLength(text, position);
                kind = Keywords.Classify(text.Substring(start, position - start));
            }
            else if (c == '"')
            {
                position = LexString(text, position, end);
                kind = MotionToken.String;
            }
            else if (c == '\'')
            {
                position = LexMarks(text, position, end);
                kind = MotionToken.Mark;
            }
            else
            {
                kind = Punctuation(c);
                position += kind is null && char.IsHighSurrogate(c) && position + 1 < end && char.IsLowSurrogate(text[position + 1]) ? 2 : 1;
                if (kind is null)
                {
                    if (badRunStart < 0)
                    {
                        badRunStart = start;
                    }

                    continue;
                }
            }

            if (badRunStart >= 0)
            {
                ReportBadCharacters(text, badRunStart, start);
                badRunStart = -1;
            }

            if (kind is { } found)
            {
                var startSpan = At(text, start);
                cursor = At(text, position);
                yield return Result.Value(found, startSpan, cursor);
                if (found == MotionToken.Number)
                {
                    foreach (var unit in LexUnitAfterNumber(text, ref position, end, ref cursor))
                    {
                        yield return unit;
                    }
                }
            }
        }

        if (badRunStart >= 0)
        {
            ReportBadCharacters(text, badRunStart, end);
        }
    }

    // Superpower keeps a line and column in each position, used only in its own messages; ours come from
    // SourceText, so the column here is a placeholder and walking the text character by character is avoided.
    private static SpanOfText At(string text, int offset) => new(text, new Position(offset, 1, offset + 1), text.Length - offset);

    private static MotionToken? Punctuation(char c) => c switch
    {
        '+' => MotionToken.Plus,
        '-' => MotionToken.Minus,
        '*' => MotionToken.Star,
        '/' => MotionToken.Slash,
        '^' => MotionToken.Caret,
        '(' => MotionToken.LeftParen,
        ')' => MotionToken.RightParen,
        '[' => MotionToken.LeftBracket,
        ']' => MotionToken.RightBracket,
        '{' => MotionToken.LeftBrace,
        '}' => MotionToken.RightBrace,
        ',' => MotionToken.Comma,
        '.' => MotionToken.Dot,
        '=' => MotionToken.Equals,
        ':' => MotionToken.Colon,
        _ => null,
    };

    private void ReportBadCharacters(string text, int start, int end)
    {
        var shown = text.Substring(start, Math.Min(end - start, 8));
        var message = end - start == 1 || (end - start == 2 && char.IsHighSurrogate(text[start]))
            ? $"unexpected character '{Printable(shown)}'"
            : $"unexpected characters '{Printable(shown)}'";
        _errors.Add(new LexicalError(LanguageDiagnosticCodes.UnexpectedCharacter, new Text.TextSpan(start, end - start), message));
    }

    private static string Printable(string text)
    {
        var builder = new System.Text.StringBuilder();
        foreach (var c in text)
        {
            if (char.IsControl(c))
            {
                builder.Append("\\u").Append(((int)c).ToString("X4", System.Globalization.CultureInfo.InvariantCulture));
            }
            else
            {
                builder.Append(c);
            }
        }

        return builder.ToString();
    }

    private int LexNumber(string text, int position, int end)
    {
        var start = position;
        while (position < end && UnitText.IsDigit(text[position]))
        {
            position++;
        }

        if (position < end && text[position] == '.')
        {
            if (position + 1 < end && UnitText.IsDigit(text[position + 1]))
            {
                position++;
                while (position < end && UnitText.IsDigit(text[position]))
                {
                    position++;
                }
            }
            else
            {
                position++;
                _errors.Add(new LexicalError(
                    LanguageDiagnosticCodes.DigitAfterPointExpected,
                    new Text.TextSpan(start, position - start),
                    $"the number '{text.Substring(start, position - start)}' needs a digit after its decimal point (write '{text.Substring(start, position - start)}0')"));
                return position;
            }
        }

        if (position < end && (text[position] == 'e' || text[position] == 'E'))
        {
            var digits = position + 1;
            if (digits < end && (text[digits] == '+' || text[digits] == '-'))
            {
                digits++;
            }

            if (digits < end && UnitText.IsDigit(text[digits]))
            {
                position = digits;
                while (position < end && UnitText.IsDigit(text[position]))
                {
                    position++;
                }
            }
        }

        if (position - start > Limits.NumberLength)
        {
            _errors.Add(new LexicalError(
                LanguageDiagnosticCodes.NumberTooLong,
                new Text.TextSpan(start, position - start),
                $"this number has {position - start} characters; the limit is {Limits.NumberLength}"));
        }

        return position;
    }

    private static IEnumerable<Result<MotionToken>> LexUnitAfterNumber(string text, ref int position, int end, ref SpanOfText cursor)
    {
        var look = position;
        while (look < end && (text[look] == ' ' || text[look] == '\t'))
        {
            look++;
        }

        var word = UnitText.NameLength(text, look);
        if (word == 0 || look + word > end)
        {
            return [];
        }

        var name = text.Substring(look, word);
        if (UnitTable.Find(name) is null && Keywords.IsReserved(name))
        {
            return [];
        }

        var length = Math.Min(UnitText.UnitLength(text, look), end - look);
        var startSpan = At(text, look);
        cursor = At(text, look + length);
        position = look + length;
        return [Result.Value(MotionToken.Unit, startSpan, cursor)];
    }

    private int LexString(string text, int position, int end)
    {
        var start = position;
        position++;
        while (position < end)
        {
            var c = text[position];
            if (c == '"')
            {
                return position + 1;
            }

            if (c == '\r' || c == '\n')
            {
                break;
            }

            if (c == '\\')
            {
                if (position + 1 < end && (text[position + 1] == '"' || text[position + 1] == '\\'))
                {
                    position += 2;
                    continue;
                }

                _errors.Add(new LexicalError(
                    LanguageDiagnosticCodes.InvalidEscape,
                    new Text.TextSpan(position, Math.Min(2, end - position)),
                    "in a string only \\\" and \\\\ are escapes; write \\\\ for a backslash"));
            }

            position++;
        }

        _errors.Add(new LexicalError(
            LanguageDiagnosticCodes.UnterminatedString,
            new Text.TextSpan(start, position - start),
            "this string has no closing '\"' on its line"));
        return position;
    }

    private int LexMarks(string text, int position, int end)
    {
        var start = position;
        while (position < end && text[position] == '\'')
        {
            position++;
        }

        var count = position - start;
        var attached = start > 0 && UnitText.IsNamePart(text[start - 1]);
        if (!attached)
        {
            _errors.Add(new LexicalError(
                LanguageDiagnosticCodes.MisplacedMark,
                new Text.TextSpan(start, count),
                "a mark (') goes directly after the name of a coord, with no space"));
        }
        else if (count > 2)
        {
            _errors.Add(new LexicalError(
                LanguageDiagnosticCodes.TooManyMarks,
                new Text.TextSpan(start, count),
                $"{count} marks: a coord has a rate (') and an acceleration ('') only"));
        }

        return position;
    }
}
