using System.Text;
using MotionSpec.Language.Diagnostics;
using MotionSpec.Language.Text;
using C = MotionSpec.Language.Diagnostics.LanguageDiagnosticCodes;

namespace MotionSpec.Language.Tests;

/// <summary>Every code of the catalog, provoked by a small spec and found at its exact line and column.</summary>
public class LocatedDiagnosticTests
{
    private static string Lines(IEnumerable<string> lines) => string.Join("\n", lines) + "\n";

    private static readonly Dictionary<string, (Func<byte[]> Input, int Line, int Column)> Cases = new()
    {
        [C.InvalidUtf8] = (() => [.. Encoding.UTF8.GetBytes("param a = 1\nparam é = 2 "), 0xFF], 2, 13),
        [C.FileTooLarge] = (() => Encoding.ASCII.GetBytes(new string(' ', Limits.FileSizeBytes + 1)), 1, 1),
        [C.UnexpectedCharacter] = (Text("param a = 1 ? 2"), 1, 13),
        [C.DigitAfterPointExpected] = (Text("param a = 1."), 1, 11),
        [C.TooManyMarks] = (Text("coord q : angle\nlet v = q'''"), 2, 10),
        [C.UnterminatedString] = (Text("title \"abc"), 1, 7),
        [C.InvalidEscape] = (Text("title \"a\\qb\""), 1, 9),
        [C.MisplacedString] = (Text("param a = \"x\""), 1, 11),
        [C.MisplacedMark] = (Text("coord q : angle\nlet v = q '"), 2, 11),
        [C.NumberTooLong] = (Text("param a = " + new string('7', Limits.NumberLength + 1)), 1, 11),
        [C.SyntaxError] = (Text("param a 1"), 1, 9),
        [C.StatementExpected] = (Text("a = 1"), 1, 1),
        [C.MisplacedFrameItem] = (Text("frame a\norigin at [0, 0, 0]"), 2, 1),
        [C.UnclosedBlock] = (Text("frame a\nframe b in a {\nparam c = 1"), 2, 14),
        [C.MisplacedBrace] = (Text("param a = 1\n}"), 2, 1),
        [C.DuplicateTitle] = (Text("title \"a\"\ntitle \"b\""), 2, 1),
        [C.RootFrameBlock] = (Text("frame a {\n}"), 1, 9),
        [C.AxisNotNumbers] = (Text("frame a\nframe b in a {\n rotate about w by 1\n}"), 3, 15),
        [C.SpinNotBracket] = (Text("frame a\nframe b in a {\n spin a.x\n}"), 3, 7),
        [C.NestingTooDeep] = (Text("param a = " + new string('(', Limits.ExpressionNesting + 1) + "1" + new string(')', Limits.ExpressionNesting + 1)), 1, 11 + Limits.ExpressionNesting),
        [C.StatementTooLong] = (Text("param a = 1" + string.Concat(Enumerable.Repeat(" + 1", Limits.OperatorsPerStatement + 1))), 1, 13 + (4 * Limits.OperatorsPerStatement)),
        [C.UnknownName] = (Text("param len = 2\nparam b = lne"), 2, 11),
        [C.DuplicateName] = (Text("param a = 1\ncoord a : angle"), 2, 7),
        [C.UnknownFrame] = (Text("frame trolley\nframe hook in trolly"), 2, 15),
        [C.UnknownSubject] = (Text("frame f\nreport tipp in f"), 2, 8),
        [C.WrongKind] = (Text("param a = 1\nframe b in a"), 2, 12),
        [C.FrameInOwnBlock] = (Text("frame a\nframe b in a {\n origin at [1, 0, 0] in b\n}"), 3, 25),
        [C.MarkOnNonCoord] = (Text("param a = 1\nlet b = a'"), 2, 9),
        [C.ParamNotConstant] = (Text("param a = 2 * t"), 1, 15),
        [C.RotateAndSpin] = (Text("frame a\nframe b in a {\n rotate about z by 1\n spin [1, 0, 0]\n}"), 4, 2),
        [C.DuplicateOrigin] = (Text("frame a\nframe b in a {\n origin at [1, 0, 0]\n origin at [2, 0, 0]\n}"), 4, 2),
        [C.DuplicateSpin] = (Text("frame a\nframe b in a {\n spin [1, 0, 0]\n spin [1, 0, 0]\n}"), 4, 2),
        [C.ZeroAxis] = (Text("frame a\nframe b in a {\n rotate about [0, 0, 0] by 1\n}"), 3, 15),
        [C.ReportAcrossTrees] = (Text("frame a\nframe b\nreport a in b"), 3, 13),
        [C.ViaOnFrameReport] = (Text("frame a\nframe b in a\nreport b in a via a"), 3, 19),
        [C.ReportNameClash] = (Text("frame a\npoint p in a at [0, 0, 0]\nreport p in a as tipLoad\nreport p in a as TipLoad"), 4, 18),
        [C.TreeTooDeep] = (Text(Lines(new[] { "frame f0" }.Concat(Enumerable.Range(1, Limits.FrameTreeDepth + 1).Select(i => $"frame f{i} in f{i - 1}")))), Limits.FrameTreeDepth + 2, 7),
        [C.TooManyFrames] = (Text(Lines(Enumerable.Range(0, Limits.Frames + 1).Select(i => $"frame f{i}"))), Limits.Frames + 1, 7),
        [C.TooManyPoints] = (Text(Lines(new[] { "frame f" }.Concat(Enumerable.Range(0, Limits.Points + 1).Select(i => $"point p{i} in f at [0,0,0]")))), Limits.Points + 2, 7),
        [C.TooManyReports] = (Text(Lines(new[] { "frame f" }.Concat(Enumerable.Range(0, Limits.Reports + 1).Select(i => $"report f in f as r{i}")))), Limits.Reports + 2, 8),
        [C.UnknownUnit] = (Text("param L = 2 m\nparam b = 2 L"), 2, 13),
        [C.DimensionMismatch] = (Text("param a = 1 m + 1 s"), 1, 11),
        [C.WrongDimension] = (Text("frame a\nframe b in a {\n rotate about z by 2 m\n}"), 3, 20),
        [C.FunctionArgumentDimension] = (Text("param a = sin(2 m)"), 1, 15),
        [C.SqrtOddDimension] = (Text("param a = sqrt(2 m)"), 1, 11),
        [C.FractionalPowerOfDimension] = (Text("param a = (2 m)^(1/2)"), 1, 11),
        [C.BracketDimensions] = (Text("frame a\npoint p in a at [1 m, 1 s, 0]"), 2, 17),
        [C.NonFiniteConstant] = (Text("param a = 1\nparam b = sqrt(-a)"), 2, 11),
        [C.DivisionByZero] = (Text("param a = 1 / (2 - 2)"), 1, 15),
        [C.ExponentNotNumbers] = (Text("param k = 2\nparam a = 3^k"), 2, 13),
        [C.ExponentTooLarge] = (Text("param a = 2^2000"), 1, 13),
        [C.VectorExpected] = (Text("frame a\nframe b in a {\n origin at 1 m\n}"), 3, 12),
        [C.ScalarExpected] = (Text("param a = [1, 2, 3]"), 1, 11),
        [C.InvalidVectorArithmetic] = (Text("frame a\npoint p in a at a.x * a.y"), 2, 21),
        [C.Atan2Dimensions] = (Text("param a = atan2(1 m, 1 s)"), 1, 11),
        [C.ArgumentCount] = (Text("param a = sin(1, 2)"), 1, 11),
    };

    public static TheoryData<string> Codes()
    {
        var data = new TheoryData<string>();
        foreach (var code in Cases.Keys.OrderBy(k => k, StringComparer.Ordinal))
        {
            data.Add(code);
        }

        return data;
    }

    [Theory]
    [MemberData(nameof(Codes))]
    public void Code_is_reported_at_its_line_and_column(string code)
    {
        var (input, line, column) = Cases[code];
        var bag = new DiagnosticBag();
        var source = FrontEnd.Decode("case.motion", input(), bag);
        if (source is not null)
        {
            FrontEnd.Run(source, bag);
        }

        var match = bag.Items.FirstOrDefault(d => d.Code == code);
        Assert.True(match is not null, $"expected {code}, got:\n" + string.Join("\n", bag.Items.Select(Compile.Format)));
        Assert.Equal(new LinePosition(line, column), match!.Start);
        Assert.True(match.IsError);
        Assert.False(string.IsNullOrWhiteSpace(match.Message));
    }

    [Fact]
    public void Every_code_of_the_catalog_has_a_located_case()
    {
        var missing = C.All.Select(e => e.Key).Where(code => !Cases.ContainsKey(code)).ToList();
        Assert.True(missing.Count == 0, "codes with no located test: " + string.Join(", ", missing));
    }

    [Fact]
    public void Catalog_lists_every_constant_once_with_a_description()
    {
        var constants = C.DeclaredConstants().OrderBy(c => c, StringComparer.Ordinal).ToList();
        var listed = C.All.Select(e => e.Key).OrderBy(c => c, StringComparer.Ordinal).ToList();
        Assert.Equal(constants, listed);
        Assert.Equal(listed.Count, listed.Distinct().Count());
        Assert.All(C.All, e =>
        {
            Assert.Matches("^MOT[123][0-9]{3}$", e.Key);
            Assert.False(string.IsNullOrWhiteSpace(e.Value));
        });
    }

    [Fact]
    public void Unknown_frame_message_matches_the_command_line_example()
    {
        var d = Compile.Expect("frame trolley\nframe hook in trolly", C.UnknownFrame, 2, 15);
        Assert.Equal("unknown frame 'trolly'; did you mean 'trolley'?", d.Message);
    }

    [Fact]
    public void Unknown_unit_suggests_the_product_with_a_declared_name()
    {
        var d = Compile.Expect("param L = 2 m\nparam b = 2 L", C.UnknownUnit, 2, 13);
        Assert.StartsWith("unknown unit 'L'", d.Message);
        Assert.Contains("'2 * L'", d.Message);
        var plain = Compile.Expect("param a = 3 furlong", C.UnknownUnit, 1, 13);
        Assert.StartsWith("unknown unit 'furlong'", plain.Message);
    }

    [Fact]
    public void Hour_after_a_number_is_the_unit_even_where_h_is_declared()
    {
        var d = Compile.Expect("param h = 2 m\nparam a = 2 h + 1 m", C.DimensionMismatch, 2, 11);
        Assert.Contains("hour", d.Message);
        Assert.Contains("'2 * h'", d.Message);
        var spec = Compile.Clean("param h = 2 m\nparam a = 2 * h + 1 m");
        Assert.Equal(5.0, spec.Parameters[1].Value);
    }

    [Fact]
    public void In_after_a_number_is_the_inch()
    {
        var d = Compile.Expect("frame a\nframe b in a {\n rotate about z by 2 in\n}", C.WrongDimension, 3, 20);
        Assert.Contains("inch", d.Message);
    }

    private static Func<byte[]> Text(string text) => () => Encoding.UTF8.GetBytes(text);
}
