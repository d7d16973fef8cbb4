using MotionSpec.Language.Binding;
using MotionSpec.Language.Lexing;
using MotionSpec.Language.Syntax;
using Superpower;
using Superpower.Model;
using Superpower.Parsers;
using TextSpan = MotionSpec.Language.Text.TextSpan;

namespace MotionSpec.Language.Parsing;

/// <summary>
/// The grammar as Superpower token parsers, built bottom-up: tokens, then primaries, then operators by
/// precedence (marks, calls, ^, unary minus, * /, + -), then statements. The one entry,
/// <see cref="Statement"/>, parses one statement to the end of its tokens; <see cref="Parser"/> cuts a file
/// into statements at their keywords, so an error in one statement never hides the next.
/// </summary>
internal static class TokenParsers
{
    private static readonly TokenListParser<MotionToken, Token<MotionToken>> Plus = Token.EqualTo(MotionToken.Plus);
    private static readonly TokenListParser<MotionToken, Token<MotionToken>> Minus = Token.EqualTo(MotionToken.Minus);
    private static readonly TokenListParser<MotionToken, Token<MotionToken>> Star = Token.EqualTo(MotionToken.Star);
    private static readonly TokenListParser<MotionToken, Token<MotionToken>> Slash = Token.EqualTo(MotionToken.Slash);
    private static readonly TokenListParser<MotionToken, Token<MotionToken>> Caret = Token.EqualTo(MotionToken.Caret);
    private static readonly TokenListParser<MotionToken, Token<MotionToken>> Comma = Token.EqualTo(MotionToken.Comma);
    private static readonly TokenListParser<MotionToken, Token<MotionToken>> Dot = Token.EqualTo(MotionToken.Dot);
    private static readonly TokenListParser<MotionToken, Token<MotionToken>> LeftParen = Token.EqualTo(MotionToken.LeftParen);
    private static readonly TokenListParser<MotionToken, Token<MotionToken>> RightParen = Token.EqualTo(MotionToken.RightParen);
    private static readonly TokenListParser<MotionToken, Token<MotionToken>> LeftBracket = Token.EqualTo(MotionToken.LeftBracket);
    private static readonly TokenListParser<MotionToken, Token<MotionToken>> RightBracket = Token.EqualTo(MotionToken.RightBracket);
    private static readonly TokenListParser<MotionToken, Token<MotionToken>> EqualsSign = Token.EqualTo(MotionToken.Equals);
    private static readonly TokenListParser<MotionToken, Token<MotionToken>> Colon = Token.EqualTo(MotionToken.Colon);

    private static readonly TokenListParser<MotionToken, Token<MotionToken>> InKeyword = Token.EqualTo(MotionToken.In);
    private static readonly TokenListParser<MotionToken, Token<MotionToken>> AtKeyword = Token.EqualTo(MotionToken.At);
    private static readonly TokenListParser<MotionToken, Token<MotionToken>> AboutKeyword = Token.EqualTo(MotionToken.About);
    private static readonly TokenListParser<MotionToken, Token<MotionToken>> ByKeyword = Token.EqualTo(MotionToken.By);
    private static readonly TokenListParser<MotionToken, Token<MotionToken>> ViaKeyword = Token.EqualTo(MotionToken.Via);
    private static readonly TokenListParser<MotionToken, Token<MotionToken>> BasisKeyword = Token.EqualTo(MotionToken.Basis);
    private static readonly TokenListParser<MotionToken, Token<MotionToken>> AsKeyword = Token.EqualTo(MotionToken.As);

    /// <summary>A name where one is declared or a frame or point is named.</summary>
    private static readonly TokenListParser<MotionToken, IdentifierSyntax> Identifier =
        Token.EqualTo(MotionToken.Identifier).Select(t => new IdentifierSyntax(SpanOf(t), t.ToStringValue())).Named("name");

    /// <summary><c>x</c>, <c>y</c> or <c>z</c> after <c>.</c>.</summary>
    private static readonly TokenListParser<MotionToken, IdentifierSyntax> AxisName =
        Token.EqualToValue(MotionToken.Identifier, "x")
            .Or(Token.EqualToValue(MotionToken.Identifier, "y"))
            .Or(Token.EqualToValue(MotionToken.Identifier, "z"))
            .Select(t => new IdentifierSyntax(SpanOf(t), t.ToStringValue()))
            .Named("axis x, y or z");

    /// <summary><c>9.81 m/s^2</c>.</summary>
    private static readonly TokenListParser<MotionToken, ExpressionSyntax> Number =
        Parse.Sequence(Token.EqualTo(MotionToken.Number), Token.EqualTo(MotionToken.Unit).OptionalOrDefault())
        .Select(p => (ExpressionSyntax)MakeNumber(p.Item1, p.Item2));

    private static NumberSyntax MakeNumber(Token<MotionToken> number, Token<MotionToken> unit) =>
        unit.HasValue
            ? new NumberSyntax(TextSpan.Cover(SpanOf(number), SpanOf(unit)), number.ToStringValue(), SpanOf(number), new UnitSyntax(SpanOf(unit), unit.ToStringValue()))
            : new NumberSyntax(SpanOf(number), number.ToStringValue(), SpanOf(number), null);

    /// <summary><c>t</c>.</summary>
    private static readonly TokenListParser<MotionToken, ExpressionSyntax> Time =
        Parse.Sequence(Token.EqualTo(MotionToken.Time), Token.EqualTo(MotionToken.Mark).OptionalOrDefault())
            .Select(p => (ExpressionSyntax)(p.Item2.HasValue
                ? new TimeSyntax(TextSpan.Cover(SpanOf(p.Item1), SpanOf(p.Item2)), Math.Min(p.Item2.Span.Length, 2))
                : new TimeSyntax(SpanOf(p.Item1))));

    /// <summary><c>pi</c>.</summary>
    private static readonly TokenListParser<MotionToken, ExpressionSyntax> Pi =
        Token.EqualTo(MotionToken.Pi).Select(t => (ExpressionSyntax)new PiSyntax(SpanOf(t)));

    /// <summary><c>psi</c>, <c>psi'</c>, <c>psi''</c> or <c>boom.x</c>.</summary>
    private static readonly TokenListParser<MotionToken, ExpressionSyntax> NameOrUnitVector =
        Parse.Sequence(
                Token.EqualTo(MotionToken.Identifier),
                Optional(Dot.IgnoreThen(AxisName).Select(axis => (object)axis).Or(Token.EqualTo(MotionToken.Mark).Select(mark => (object)mark))))
            .Select(p => MakeName(p.Item1, p.Item2));

    private static ExpressionSyntax MakeName(Token<MotionToken> name, object? suffix) =>
        suffix switch
        {
            IdentifierSyntax axis => (ExpressionSyntax)new UnitVectorSyntax(
                TextSpan.Cover(SpanOf(name), axis.Span), new IdentifierSyntax(SpanOf(name), name.ToStringValue()), axis),
            Token<MotionToken> mark => new NameSyntax(TextSpan.Cover(SpanOf(name), SpanOf(mark)), name.ToStringValue(), Math.Min(mark.Span.Length, 2)),
            _ => new NameSyntax(SpanOf(name), name.ToStringValue(), 0),
        };

    /// <summary><c>sin(x)</c>, <c>atan2(y, x)</c>.</summary>
    private static readonly TokenListParser<MotionToken, ExpressionSyntax> Call =
        Parse.Sequence(Token.EqualTo(MotionToken.Function), LeftParen, Parse.Ref(() => Expression!).ManyDelimitedBy(Comma), RightParen)
            .Select(p => (ExpressionSyntax)new CallSyntax(
                TextSpan.Cover(SpanOf(p.Item1), SpanOf(p.Item4)),
                new IdentifierSyntax(SpanOf(p.Item1), p.Item1.ToStringValue()),
                p.Item3));

    /// <summary><c>(a + b)</c>.</summary>
    private static readonly TokenListParser<MotionToken, ExpressionSyntax> Parenthesized =
        Parse.Sequence(LeftParen, Parse.Ref(() => Expression!), RightParen)
            .Select(p => (ExpressionSyntax)new ParenthesizedSyntax(TextSpan.Cover(SpanOf(p.Item1), SpanOf(p.Item3)), p.Item2));

    /// <summary><c>[e1, e2, e3]</c> with an optional <c>in F</c> binding tighter than any operator.</summary>
    private static readonly TokenListParser<MotionToken, ExpressionSyntax> Bracket =
        Parse.Sequence(
                LeftBracket,
                Parse.Ref(() => Expression!).ManyDelimitedBy(Comma).Where(c => c.Length == 3, "three components"),
                RightBracket,
                Optional(InKeyword.IgnoreThen(Identifier)))
            .Select(p => (ExpressionSyntax)new BracketSyntax(TextSpan.Cover(SpanOf(p.Item1), p.Item4?.Span ?? SpanOf(p.Item3)), p.Item2, p.Item4));

    /// <summary>Anything that binds tighter than <c>^</c>.</summary>
    private static readonly TokenListParser<MotionToken, ExpressionSyntax> Primary =
        ByFirstToken(
            "expression",
            (MotionToken.Number, Number),
            (MotionToken.Time, Time),
            (MotionToken.Pi, Pi),
            (MotionToken.Identifier, NameOrUnitVector),
            (MotionToken.Function, Call),
            (MotionToken.LeftParen, Parenthesized),
            (MotionToken.LeftBracket, Bracket));

    /// <summary><c>a^b</c>, right-associative; the exponent may begin with unary minus (<c>x^-2</c>).</summary>
    private static readonly TokenListParser<MotionToken, ExpressionSyntax> Power =
        Parse.Sequence(Primary, Optional(Caret.IgnoreThen(Parse.Ref(() => Exponent!))))
            .Select(p => p.Item2 is null ? p.Item1 : new PowerSyntax(TextSpan.Cover(p.Item1.Span, p.Item2.Span), p.Item1, p.Item2));

    /// <summary>The exponent of <c>^</c>: a power, or a negated exponent.</summary>
    private static readonly TokenListParser<MotionToken, ExpressionSyntax> Exponent =
        Parse.Sequence(Minus, Parse.Ref(() => Exponent!)).Select(Negate).Or(Power);

    /// <summary><c>-a</c>: binds looser than <c>^</c>, so <c>-x^2</c> is <c>-(x^2)</c>.</summary>
    private static readonly TokenListParser<MotionToken, ExpressionSyntax> Unary =
        Parse.Sequence(Minus, Parse.Ref(() => Unary!)).Select(Negate).Or(Power);

    /// <summary><c>a * b</c>, <c>a / b</c>, left-associative.</summary>
    private static readonly TokenListParser<MotionToken, ExpressionSyntax> Product =
        Parse.Chain(Star.Or(Slash), Unary, MakeBinary);

    /// <summary><c>a + b</c>, <c>a - b</c>, left-associative: a whole expression.</summary>
    private static readonly TokenListParser<MotionToken, ExpressionSyntax> Expression =
        Parse.Chain(Plus.Or(Minus), Product, MakeBinary);

    /// <summary><c>title "Harbour crane"</c>.</summary>
    private static readonly TokenListParser<MotionToken, SyntaxNode> Title =
        from keyword in Token.EqualTo(MotionToken.Title)
        from text in Token.EqualTo(MotionToken.String)
        select (SyntaxNode)new TitleSyntax(TextSpan.Cover(SpanOf(keyword), SpanOf(text)), Unescape(text.ToStringValue()));

    /// <summary><c>param L = 18 m</c>.</summary>
    private static readonly TokenListParser<MotionToken, SyntaxNode> Param =
        Parse.Sequence(Token.EqualTo(MotionToken.Param), Identifier, EqualsSign, Expression)
            .Select(p => (SyntaxNode)new ParamSyntax(TextSpan.Cover(SpanOf(p.Item1), p.Item4.Span), p.Item2, p.Item4));

    /// <summary><c>angle</c> or <c>length</c>.</summary>
    private static readonly TokenListParser<MotionToken, (CoordKind Kind, TextSpan Span)> CoordKindName =
        Token.EqualToValue(MotionToken.Identifier, "angle").Select(t => (CoordKind.Angle, SpanOf(t)))
            .Or(Token.EqualToValue(MotionToken.Identifier, "length").Select(t => (CoordKind.Length, SpanOf(t))))
            .Named("coord kind `angle` or `length`");

    /// <summary><c>coord psi : angle</c>.</summary>
    private static readonly TokenListParser<MotionToken, SyntaxNode> Coord =
        from keyword in Token.EqualTo(MotionToken.Coord)
        from name in Identifier
        from colon in Colon
        from kind in CoordKindName
        select (SyntaxNode)new CoordSyntax(TextSpan.Cover(SpanOf(keyword), kind.Span), name, kind.Kind);

    /// <summary><c>let yaw = w * t + psi</c>.</summary>
    private static readonly TokenListParser<MotionToken, SyntaxNode> Let =
        Parse.Sequence(Token.EqualTo(MotionToken.Let), Identifier, EqualsSign, Expression)
            .Select(p => (SyntaxNode)new LetSyntax(TextSpan.Cover(SpanOf(p.Item1), p.Item4.Span), p.Item2, p.Item4));

    /// <summary><c>frame boom in quay</c>; the block that may follow is assembled by <see cref="Parser"/>.</summary>
    private static readonly TokenListParser<MotionToken, SyntaxNode> FrameHeader =
        from keyword in Token.EqualTo(MotionToken.Frame)
        from name in Identifier
        from parent in Optional(InKeyword.IgnoreThen(Identifier))
        select (SyntaxNode)new FrameSyntax(TextSpan.Cover(SpanOf(keyword), parent?.Span ?? name.Span), name, parent, null);

    /// <summary>The axis after <c>about</c>: a name (x, y or z) or a bracket.</summary>
    private static readonly TokenListParser<MotionToken, SyntaxNode> RotationAxis =
        Identifier.Select(id => (SyntaxNode)id).Or(Bracket.Select(b => (SyntaxNode)b)).Named("axis x, y, z or [a, b, c]");

    /// <summary><c>rotate about z by yaw</c>.</summary>
    private static readonly TokenListParser<MotionToken, SyntaxNode> Rotate =
        from keyword in Token.EqualTo(MotionToken.Rotate)
        from about in AboutKeyword
        from axis in RotationAxis
        from byWord in ByKeyword
        from angle in Expression
        select (SyntaxNode)new RotateSyntax(TextSpan.Cover(SpanOf(keyword), angle.Span), axis, angle);

    /// <summary><c>origin at [s, 0, h]</c>.</summary>
    private static readonly TokenListParser<MotionToken, SyntaxNode> Origin =
        from keyword in Token.EqualTo(MotionToken.Origin)
        from at in AtKeyword
        from position in Expression
        select (SyntaxNode)new OriginSyntax(TextSpan.Cover(SpanOf(keyword), position.Span), position);

    /// <summary><c>spin [a', b', c']</c>.</summary>
    private static readonly TokenListParser<MotionToken, SyntaxNode> Spin =
        from keyword in Token.EqualTo(MotionToken.Spin)
        from rates in Expression
        select (SyntaxNode)new SpinSyntax(TextSpan.Cover(SpanOf(keyword), rates.Span), rates);

    /// <summary><c>point tip in hook at [0, 0, -L/3]</c>.</summary>
    private static readonly TokenListParser<MotionToken, SyntaxNode> Point =
        Parse.Sequence(Parse.Sequence(Token.EqualTo(MotionToken.Point), Identifier, InKeyword, Identifier, AtKeyword), Expression)
            .Select(p => (SyntaxNode)new PointSyntax(TextSpan.Cover(SpanOf(p.Item1.Item1), p.Item2.Span), p.Item1.Item2, p.Item1.Item4, p.Item2));

    /// <summary><c>report tip in quay via trolley basis boom as tipLoad</c>, clauses in that order.</summary>
    private static readonly TokenListParser<MotionToken, SyntaxNode> Report =
        Parse.Sequence(
                Parse.Sequence(Token.EqualTo(MotionToken.Report), Identifier, InKeyword, Identifier),
                Optional(ViaKeyword.IgnoreThen(Identifier)),
                Optional(BasisKeyword.IgnoreThen(Identifier)),
                Optional(AsKeyword.IgnoreThen(Identifier)))
            .Select(p => (SyntaxNode)new ReportSyntax(
                TextSpan.Cover(SpanOf(p.Item1.Item1), (p.Item4 ?? p.Item3 ?? p.Item2 ?? p.Item1.Item4).Span),
                p.Item1.Item2, p.Item1.Item4, p.Item2, p.Item3, p.Item4));

    /// <summary>One statement, which must use every token it is given.</summary>
    public static readonly TokenListParser<MotionToken, SyntaxNode> Statement =
        ByFirstToken(
            "statement",
            (MotionToken.Title, Title),
            (MotionToken.Param, Param),
            (MotionToken.Coord, Coord),
            (MotionToken.Let, Let),
            (MotionToken.Frame, FrameHeader),
            (MotionToken.Rotate, Rotate),
            (MotionToken.Origin, Origin),
            (MotionToken.Spin, Spin),
            (MotionToken.Point, Point),
            (MotionToken.Report, Report))
        .AtEnd();

    /// <summary>
    /// The same as trying each alternative in turn with <c>Or</c>, since each begins with its own token, but it
    /// picks the one alternative directly: trying and failing allocates, and specs can have 100,000 statements.
    /// </summary>
    private static TokenListParser<MotionToken, T> ByFirstToken<T>(string expectation, params (MotionToken First, TokenListParser<MotionToken, T> Parser)[] alternatives)
    {
        var table = new TokenListParser<MotionToken, T>?[(int)MotionToken.Colon + 1];
        foreach (var (first, parser) in alternatives)
        {
            table[(int)first] = parser;
        }

        return input =>
        {
            var next = input.ConsumeToken();
            if (next.HasValue && table[(int)next.Value.Kind] is { } chosen)
            {
                return chosen(input);
            }

            return TokenListParserResult.Empty<MotionToken, T>(input, [expectation]);
        };
    }

    private static TokenListParser<MotionToken, T?> Optional<T>(TokenListParser<MotionToken, T> parser)
        where T : class => parser.Select(value => (T?)value).OptionalOrDefault();

    private static ExpressionSyntax Negate((Token<MotionToken> Minus, ExpressionSyntax Operand) p) =>
        new NegateSyntax(TextSpan.Cover(SpanOf(p.Minus), p.Operand.Span), p.Operand);

    private static ExpressionSyntax MakeBinary(Token<MotionToken> op, ExpressionSyntax left, ExpressionSyntax right) =>
        new BinarySyntax(TextSpan.Cover(left.Span, right.Span), op.Span.Source![op.Span.Position.Absolute], SpanOf(op), left, right);

    private static TextSpan SpanOf(Token<MotionToken> token) => new(token.Span.Position.Absolute, token.Span.Length);

    private static string Unescape(string quoted)
    {
        var builder = new System.Text.StringBuilder(quoted.Length);
        var end = quoted.Length > 1 && quoted[quoted.Length - 1] == '"' ? quoted.Length - 1 : quoted.Length;
        for (var i = 1; i < end; i++)
        {
            if (quoted[i] == '\\' && i + 1 < end && (quoted[i + 1] == '"' || quoted[i + 1] == '\\'))
            {
                i++;
            }

            builder.Append(quoted[i]);
        }

        return builder.ToString();
    }
}
