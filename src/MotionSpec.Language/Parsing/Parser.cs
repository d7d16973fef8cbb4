using MotionSpec.Language.Diagnostics;
using MotionSpec.Language.Lexing;
using MotionSpec.Language.Syntax;
using Superpower.Model;
using TextSpan = MotionSpec.Language.Text.TextSpan;

namespace MotionSpec.Language.Parsing;

/// <summary>
/// Parses a whole file with recovery. Every statement starts with a keyword, so the tokens are cut before each
/// statement keyword and each brace; each piece is parsed on its own by <see cref="TokenParsers.Statement"/>,
/// and frame blocks are put together from the pieces between their braces. An error costs one statement.
/// </summary>
internal static class Parser
{
    /// <summary>Parses the tokens; lexical errors are given so that a statement they already explain gets no second error.</summary>
    public static SpecSyntax Parse(string text, Token<MotionToken>[] tokens, IReadOnlyList<LexicalError> lexicalErrors, DiagnosticBag diagnostics)
    {
        var statements = new List<StatementSyntax>();
        var broken = new List<IdentifierSyntax>();
        var segments = Segments(tokens);
        OpenFrame? open = null;

        for (var index = 0; index < segments.Count; index++)
        {
            var (start, count) = segments[index];
            var regionEnd = index + 1 < segments.Count ? tokens[segments[index + 1].Start].Span.Position.Absolute : text.Length;
            var first = tokens[start];
            var firstSpan = SpanOf(first);
            if (first.Kind == MotionToken.LeftBrace)
            {
                if (count > 1)
                {
                    // Cannot happen (a brace is its own piece) but costs nothing to be sure of.
                    diagnostics.Error(LanguageDiagnosticCodes.SyntaxError, SpanOf(tokens[start + 1]), "unexpected text after '{'");
                }

                if (open is { Braced: false } header && header.LastSegmentWasHeader)
                {
                    open.Braced = true;
                    open.BraceSpan = firstSpan;
                    open.LastSegmentWasHeader = false;
                    if (header.Header is { Parent: null } root)
                    {
                        diagnostics.Error(LanguageDiagnosticCodes.RootFrameBlock, firstSpan,
                            $"frame '{root.Name}' is a root frame (no 'in PARENT'), so it has no block: it cannot move");
                    }
                }
                else
                {
                    diagnostics.Error(LanguageDiagnosticCodes.MisplacedBrace, firstSpan, "'{' opens a frame's block and must follow 'frame NAME in PARENT'");
                    open = Finish(open, statements);
                    open = new OpenFrame(null) { Braced = true, BraceSpan = firstSpan };
                }

                continue;
            }

            if (first.Kind == MotionToken.RightBrace)
            {
                if (open is { Braced: true })
                {
                    open.EndSpan = firstSpan;
                    open = Finish(open, statements);
                }
                else
                {
                    diagnostics.Error(LanguageDiagnosticCodes.MisplacedBrace, firstSpan, "'}' closes no frame block");
                }

                continue;
            }

            var isItem = first.Kind is MotionToken.Rotate or MotionToken.Origin or MotionToken.Spin;
            if (!isItem)
            {
                if (open is { Braced: true } unclosed)
                {
                    diagnostics.Error(LanguageDiagnosticCodes.UnclosedBlock, unclosed.BraceSpan,
                        unclosed.Header is null
                            ? "this block has no closing '}'"
                            : $"the block of frame '{unclosed.Header.Name}' has no closing '}}' before the next statement");
                }

                open = Finish(open, statements);
            }
            else if (open is not { Braced: true })
            {
                open = Finish(open, statements);
                diagnostics.Error(LanguageDiagnosticCodes.MisplacedFrameItem, firstSpan,
                    $"'{first.ToStringValue()}' belongs inside a frame's block: frame NAME in PARENT {{ {first.ToStringValue()} ... }}");
                ParseSegment(tokens, start, count, regionEnd, lexicalErrors, diagnostics);
                continue;
            }

            if (!Keywords.StatementStarts.Contains(first.Kind))
            {
                diagnostics.Error(LanguageDiagnosticCodes.StatementExpected, firstSpan,
                    $"expected a statement (title, param, coord, let, frame, point or report), found '{Shorten(first.ToStringValue())}'");
                continue;
            }

            var node = ParseSegment(tokens, start, count, regionEnd, lexicalErrors, diagnostics);
            if (node is null && count > 1 && tokens[start + 1].Kind == MotionToken.Identifier && first.Kind is not (MotionToken.Report or MotionToken.Title))
            {
                broken.Add(new IdentifierSyntax(SpanOf(tokens[start + 1]), tokens[start + 1].ToStringValue()));
            }

            switch (node)
            {
                case FrameItemSyntax item:
                    open!.Items.Add(item);
                    break;
                case FrameSyntax frame:
                    open = new OpenFrame(frame) { LastSegmentWasHeader = true };
                    break;
                case StatementSyntax statement:
                    statements.Add(statement);
                    break;
                case null when first.Kind == MotionToken.Frame:
                    // A frame header that failed: still absorb its block so its items are not misplaced.
                    open = new OpenFrame(null) { LastSegmentWasHeader = true };
                    break;
            }
        }

        if (open is { Braced: true } last)
        {
            diagnostics.Error(LanguageDiagnosticCodes.UnclosedBlock, last.BraceSpan,
                last.Header is null ? "this block has no closing '}'" : $"the block of frame '{last.Header.Name}' has no closing '}}'");
        }

        Finish(open, statements);
        var end = tokens.Length == 0 ? 0 : tokens[tokens.Length - 1].Span.Position.Absolute + tokens[tokens.Length - 1].Span.Length;
        return new SpecSyntax(new TextSpan(0, end), statements, broken);
    }

    private static OpenFrame? Finish(OpenFrame? open, List<StatementSyntax> statements)
    {
        if (open?.Header is { } header)
        {
            var span = open.EndSpan is { } end ? TextSpan.Cover(header.Span, end)
                : open.Items.Count > 0 ? TextSpan.Cover(header.Span, open.Items[open.Items.Count - 1].Span)
                : header.Span;
            statements.Add(new FrameSyntax(span, header.Name, header.Parent, open.Braced ? open.Items : null));
        }

        return null;
    }

    private static SyntaxNode? ParseSegment(Token<MotionToken>[] tokens, int start, int count, int regionEnd, IReadOnlyList<LexicalError> lexicalErrors, DiagnosticBag diagnostics)
    {
        var segmentStart = tokens[start].Span.Position.Absolute;
        var last = tokens[start + count - 1];
        var segmentEnd = last.Span.Position.Absolute + last.Span.Length;

        for (var i = start; i < start + count; i++)
        {
            if (tokens[i].Kind == MotionToken.String && tokens[start].Kind != MotionToken.Title)
            {
                diagnostics.Error(LanguageDiagnosticCodes.MisplacedString, SpanOf(tokens[i]), "a text string is allowed only after 'title'");
                return null;
            }
        }

        if (NestingGuard.Check(tokens, start, count) is { } tooDeep)
        {
            diagnostics.Error(tooDeep.Code, tooDeep.Span, tooDeep.Message);
            return null;
        }

        var segment = new Token<MotionToken>[count];
        Array.Copy(tokens, start, segment, 0, count);
        var result = TokenParsers.Statement(new TokenList<MotionToken>(segment));
        if (result.HasValue)
        {
            return result.Value;
        }

        // A bad character or literal in this statement's stretch of text (up to the next statement) already says
        // what is wrong; a second, derived syntax error would only confuse.
        var explained = lexicalErrors.Any(e => e.Span.Start >= segmentStart && e.Span.Start < regionEnd);
        if (!explained)
        {
            var at = result.ErrorPosition.HasValue ? result.ErrorPosition.Absolute : segmentEnd;
            var length = 1;
            if (!result.Remainder.IsAtEnd)
            {
                var next = result.Remainder.ConsumeToken();
                if (next.HasValue)
                {
                    at = next.Value.Span.Position.Absolute;
                    length = next.Value.Span.Length;
                }
            }
            else
            {
                at = segmentEnd;
                length = 0;
            }

            diagnostics.Error(LanguageDiagnosticCodes.SyntaxError, new TextSpan(at, length), Describe(result.FormatErrorMessageFragment(), tokens, start, count, at));
        }

        return null;
    }

    private static string Describe(string fragment, Token<MotionToken>[] tokens, int start, int count, int at)
    {
        var keyword = tokens[start];
        var message = fragment.TrimEnd('.').Replace("end of input", "end of statement");
        var hint = string.Empty;
        for (var i = start + 1; i < start + count; i++)
        {
            if (tokens[i].Span.Position.Absolute != at)
            {
                continue;
            }

            var kind = tokens[i].Kind;
            var previous = tokens[i - 1].Kind;
            if (keyword.Kind == MotionToken.Report && kind is MotionToken.Via or MotionToken.Basis or MotionToken.As)
            {
                hint = "; the clauses of a report come in the order via, basis, as, each at most once";
            }
            else if (EndsOperand(previous) && kind is MotionToken.Identifier or MotionToken.Number or MotionToken.LeftParen
                         or MotionToken.Function or MotionToken.Time or MotionToken.Pi or MotionToken.LeftBracket)
            {
                hint = "; there is no implicit multiplication: write '*' between the factors";
            }

            break;
        }

        return $"in this '{keyword.ToStringValue()}' statement: {message}{hint}";
    }

    private static bool EndsOperand(MotionToken kind) => kind is MotionToken.Number or MotionToken.Unit or MotionToken.Identifier
        or MotionToken.Mark or MotionToken.Time or MotionToken.Pi or MotionToken.RightParen or MotionToken.RightBracket;

    private static string Shorten(string text) => text.Length > 20 ? text.Remove(17) + "..." : text;

    private static List<(int Start, int Count)> Segments(Token<MotionToken>[] tokens)
    {
        var segments = new List<(int, int)>();
        var start = 0;
        for (var i = 1; i <= tokens.Length; i++)
        {
            if (i == tokens.Length || StartsSegment(tokens[i].Kind) || StartsSegment(tokens[i - 1].Kind, afterOnly: true))
            {
                segments.Add((start, i - start));
                start = i;
            }
        }

        return tokens.Length == 0 ? [] : segments;
    }

    private static bool StartsSegment(MotionToken kind, bool afterOnly = false) =>
        kind is MotionToken.LeftBrace or MotionToken.RightBrace || (!afterOnly && Keywords.StatementStarts.Contains(kind));

    private static TextSpan SpanOf(Token<MotionToken> token) => new(token.Span.Position.Absolute, token.Span.Length);

    /// <summary>A frame header whose block may still be open.</summary>
    private sealed class OpenFrame(FrameSyntax? header)
    {
        public FrameSyntax? Header { get; } = header;

        public List<FrameItemSyntax> Items { get; } = [];

        public bool Braced { get; set; }

        public bool LastSegmentWasHeader { get; set; }

        public TextSpan BraceSpan { get; set; }

        public TextSpan? EndSpan { get; set; }
    }
}
