using MotionSpec.Language.Diagnostics;
using MotionSpec.Language.Lexing;
using MotionSpec.Language.Parsing;
using MotionSpec.Language.Syntax;

namespace MotionSpec.Language.Tests;

public class ParserTests
{
    internal static SpecSyntax Parse(string text, out IReadOnlyList<Diagnostic> diagnostics)
    {
        var tokenizer = new MotionTokenizer();
        var tokens = tokenizer.TryTokenize(text).Value.ToArray();
        var bag = new DiagnosticBag();
        foreach (var e in tokenizer.Errors)
        {
            bag.Error(e.Code, e.Span, e.Message);
        }

        var spec = Parser.Parse(text, tokens, tokenizer.Errors, bag);
        diagnostics = bag.Items;
        return spec;
    }

    private static StatementSyntax One(string text)
    {
        var spec = Parse(text, out var diagnostics);
        Assert.Empty(diagnostics);
        return Assert.Single(spec.Statements);
    }

    private static ExpressionSyntax Expr(string expression) => ((ParamSyntax)One("param a = " + expression)).Definition;

    [Theory]
    [InlineData("title \"Crane \\\"A\\\" \\\\ B # not a comment\"")]
    [InlineData("param L = 18 m")]
    [InlineData("coord psi : angle")]
    [InlineData("coord s : length")]
    [InlineData("let yaw = w * t + psi")]
    [InlineData("frame quay")]
    [InlineData("frame boom in quay")]
    [InlineData("frame boom in quay {\n}")]
    [InlineData("frame boom in quay {\n    rotate about z by yaw\n    rotate about [1, 1, 0] by -0.2\n    origin at [s, 0, h]\n}")]
    [InlineData("frame imu in hook {\n    spin [a', b', c'']\n}")]
    [InlineData("point tip in hook at [0, 0, -L / 3 - 0.5 m]")]
    [InlineData("point bead in boom at s * boom.x + [0, 0, h] in quay")]
    [InlineData("report tip in quay")]
    [InlineData("report tip in quay via trolley")]
    [InlineData("report bead in quay via boom basis boom as beadLoad")]
    [InlineData("report lens in hook basis imu")]
    [InlineData("report lens in hook as x")]
    [InlineData("param e = cross(u, v) + dot(u, v) * sin(x)^2 + atan2(y, x) - sqrt(exp(ln(2)))")]
    [InlineData("param e = (a + b) * -c / d^-2^3")]
    public void Every_construct_prints_back_as_it_parses(string source)
    {
        var first = One(source);
        var printed = first.ToString()!;
        var again = One(printed);
        Assert.Equal(printed, again.ToString());
        Assert.Equal(Normalize(source), Normalize(printed));
    }

    private static string Normalize(string text) => string.Join(" ", text.Split([' ', '\n'], StringSplitOptions.RemoveEmptyEntries));

    [Fact]
    public void Unary_minus_binds_looser_than_power()
    {
        var e = Assert.IsType<NegateSyntax>(Expr("-x^2"));
        Assert.IsType<PowerSyntax>(e.Operand);
    }

    [Fact]
    public void Power_is_right_associative_and_its_exponent_may_be_negated()
    {
        var p = Assert.IsType<PowerSyntax>(Expr("a^b^c"));
        Assert.IsType<PowerSyntax>(p.Exponent);
        var half = Assert.IsType<PowerSyntax>(Expr("2^-1"));
        Assert.IsType<NegateSyntax>(half.Exponent);
    }

    [Fact]
    public void Products_bind_tighter_than_sums_and_both_associate_left()
    {
        var sum = Assert.IsType<BinarySyntax>(Expr("a - b - c * d / e"));
        Assert.Equal('-', sum.Operator);
        var left = Assert.IsType<BinarySyntax>(sum.Left);
        Assert.Equal('-', left.Operator);
        var quotient = Assert.IsType<BinarySyntax>(sum.Right);
        Assert.Equal('/', quotient.Operator);
        Assert.Equal('*', Assert.IsType<BinarySyntax>(quotient.Left).Operator);
    }

    [Fact]
    public void In_binds_to_the_bracket_before_it()
    {
        var p = (PointSyntax)One("point p in f at 2 * [1, 0, 0] in g + f.x");
        var sum = Assert.IsType<BinarySyntax>(p.Position);
        var product = Assert.IsType<BinarySyntax>(sum.Left);
        var bracket = Assert.IsType<BracketSyntax>(product.Right);
        Assert.Equal("g", bracket.Basis!.Text);
        Assert.IsType<UnitVectorSyntax>(sum.Right);
    }

    [Fact]
    public void Marks_attach_to_names()
    {
        var e = Assert.IsType<BinarySyntax>(Expr("q' + q''"));
        Assert.Equal(1, Assert.IsType<NameSyntax>(e.Left).Marks);
        Assert.Equal(2, Assert.IsType<NameSyntax>(e.Right).Marks);
    }

    [Fact]
    public void Axis_names_are_ordinary_names_elsewhere()
    {
        var e = Assert.IsType<BinarySyntax>(Expr("x + y * z"));
        Assert.Equal("x", Assert.IsType<NameSyntax>(e.Left).Name);
        Assert.Equal("param x = 1", One("param x = 1").ToString());
        Assert.Equal("coord z : angle", One("coord z : angle").ToString());
    }

    [Fact]
    public void Units_are_lexed_only_after_numbers()
    {
        var e = Assert.IsType<NumberSyntax>(Expr("9.81 m/s^2"));
        Assert.Equal("m/s^2", e.Unit!.Text);
        var product = Assert.IsType<BinarySyntax>(Expr("0.01 m * sin(x)"));
        Assert.Equal("m", Assert.IsType<NumberSyntax>(product.Left).Unit!.Text);
        var split = Assert.IsType<BinarySyntax>(Expr("2 m / s"));
        Assert.Equal("s", Assert.IsType<NameSyntax>(split.Right).Name);
        Assert.Equal("ms", Assert.IsType<NumberSyntax>(Expr("100ms")).Unit!.Text);
        Assert.Equal("m*s^-2", Assert.IsType<NumberSyntax>(Expr("1 m*s^-2")).Unit!.Text);
        var power = Assert.IsType<PowerSyntax>(Expr("2 m^x"));
        Assert.Equal("m", Assert.IsType<NumberSyntax>(power.Base).Unit!.Text);
    }

    [Theory]
    [InlineData("12")]
    [InlineData("1.5")]
    [InlineData(".5")]
    [InlineData("2e-3")]
    [InlineData("6.02E+3")]
    public void Numbers_of_every_form(string number)
    {
        Assert.Equal(number, Assert.IsType<NumberSyntax>(Expr(number)).Text);
    }

    [Fact]
    public void Comments_and_line_breaks_only_separate_tokens()
    {
        var spec = Parse("param a = 1 + # comment\n 2 # another\nparam b =\n3", out var diagnostics);
        Assert.Empty(diagnostics);
        Assert.Equal(2, spec.Statements.Count);
        Assert.Equal("param a = 1 + 2", spec.Statements[0].ToString());
    }

    [Fact]
    public void Spans_cover_what_each_node_was_parsed_from()
    {
        const string text = "param a = 2 * (b + 1 m)";
        var param = (ParamSyntax)One(text);
        Assert.Equal(text.Length, param.Span.Length);
        Assert.Equal("a", text.Substring(param.Name.Span.Start, param.Name.Span.Length));
        var product = Assert.IsType<BinarySyntax>(param.Definition);
        Assert.Equal("(b + 1 m)", text.Substring(product.Right.Span.Start, product.Right.Span.Length));
    }

    [Theory]
    [InlineData("param a = 1.", LanguageDiagnosticCodes.DigitAfterPointExpected)]
    [InlineData("coord q : angle\nlet b = q'''", LanguageDiagnosticCodes.TooManyMarks)]
    [InlineData("param a = 1 +", LanguageDiagnosticCodes.SyntaxError)]
    [InlineData("param a = [1, 2]", LanguageDiagnosticCodes.SyntaxError)]
    [InlineData("param a = f.w", LanguageDiagnosticCodes.SyntaxError)]
    [InlineData("param a = +1", LanguageDiagnosticCodes.SyntaxError)]
    [InlineData("report a in b basis c via d", LanguageDiagnosticCodes.SyntaxError)]
    [InlineData("coord a : speed", LanguageDiagnosticCodes.SyntaxError)]
    [InlineData("param a = 2 3", LanguageDiagnosticCodes.SyntaxError)]
    [InlineData("param t = 1", LanguageDiagnosticCodes.SyntaxError)]
    public void Malformed_statements_are_syntax_errors(string text, string code)
    {
        Parse(text, out var diagnostics);
        Assert.Contains(diagnostics, d => d.Code == code);
    }
}
