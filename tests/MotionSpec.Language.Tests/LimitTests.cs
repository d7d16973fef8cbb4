using MotionSpec.Language.Diagnostics;
using MotionSpec.Language.Text;

namespace MotionSpec.Language.Tests;

public class LimitTests
{
    private static string Parens(int depth) => "param a = " + new string('(', depth) + "1" + new string(')', depth) + "\n";

    [Fact]
    public void Nesting_at_the_limit_is_accepted()
    {
        Compile.Clean(Parens(Limits.ExpressionNesting));
        Compile.Clean("param a = " + string.Concat(Enumerable.Repeat("-", Limits.ExpressionNesting)) + "1\n");
        Compile.Clean("param a = 1" + string.Concat(Enumerable.Repeat("^1", Limits.ExpressionNesting)) + "\n");
        Compile.Clean("param a = " + string.Concat(Enumerable.Repeat("sin(", Limits.ExpressionNesting)) + "1" + new string(')', Limits.ExpressionNesting) + "\n");
    }

    [Fact]
    public void Nesting_beyond_the_limit_is_one_located_error()
    {
        var d = Compile.Expect("param b = 2\n" + Parens(Limits.ExpressionNesting + 1), LanguageDiagnosticCodes.NestingTooDeep, 2, 11 + Limits.ExpressionNesting);
        Assert.Contains("256", d.Message);
    }

    [Fact]
    public void Very_deep_input_never_overflows_the_stack()
    {
        foreach (var text in new[]
        {
            Parens(50_000),
            "param a = " + new string('-', 50_000) + "1",
            "param a = 1" + string.Concat(Enumerable.Repeat("^1", 50_000)),
            "frame f\npoint p in f at " + new string('[', 50_000),
        })
        {
            var errors = Compile.Run(text).Diagnostics;
            Assert.Contains(errors, d => d.Code == LanguageDiagnosticCodes.NestingTooDeep);
        }
    }

    [Fact]
    public void Long_sums_up_to_the_operator_limit_bind()
    {
        var sum = "param a = 1" + string.Concat(Enumerable.Repeat(" + 1", Limits.OperatorsPerStatement)) + "\n";
        var spec = Compile.Clean(sum);
        Assert.Equal(Limits.OperatorsPerStatement + 1, spec.Parameters[0].Value);
        Compile.Expect(sum.Replace("= 1", "= 1 + 1"), LanguageDiagnosticCodes.StatementTooLong, 1, 13 + (4 * Limits.OperatorsPerStatement));
    }
}

/// <summary>
/// Each documented limit (Limits.cs, the README's table): a spec exactly at it binds clean, one beyond it is a
/// single error with the limit's code at an exact line and column. The contract only asks that limits are at
/// least those in LANGUAGE.md, so the at-limit cases pin that floor too.
/// </summary>
public class LimitEdgeTests
{
    private static string Lines(IEnumerable<string> lines) => string.Join("\n", lines) + "\n";

    /// <summary>A root and <paramref name="links"/> frames below it, each in the previous one and moving.</summary>
    private static string Chain(int links) => Lines(
        new[] { "param a = 0.25 m", "coord q : angle", "frame link0" }
            .Concat(Enumerable.Range(1, links).Select(i => $"frame link{i} in link{i - 1} {{ rotate about z by q origin at [a, 0, 0] }}"))
            .Concat([$"point tip in link{links} at [a, 0, 0]", "report tip in link0 as tipInBase"]));

    private static Diagnostic Single(string text, string code, int line, int column)
    {
        var diagnostics = Compile.Run(text).Diagnostics;
        Assert.True(diagnostics.Count == 1, "expected one diagnostic, got:\n" + string.Join("\n", diagnostics.Select(Compile.Format)));
        var d = diagnostics[0];
        Assert.Equal(code, d.Code);
        Assert.True(d.IsError);
        Assert.Equal(new LinePosition(line, column), d.Start);
        return d;
    }

    [Fact]
    public void Chain_exactly_at_the_tree_depth_limit_binds()
    {
        var spec = Compile.Clean(Chain(Limits.FrameTreeDepth));
        Assert.Equal(Limits.FrameTreeDepth + 1, spec.Frames.Count);
        Assert.Equal(Limits.FrameTreeDepth, spec.Frames[^1].Depth);
    }

    [Fact]
    public void Chain_of_3000_is_one_tree_depth_error_at_the_first_frame_beyond_the_limit()
    {
        // Line 3 + 501 holds frame link501; its name starts after "frame ".
        var d = Single(Chain(3000), LanguageDiagnosticCodes.TreeTooDeep, 3 + Limits.FrameTreeDepth + 1, 7);
        Assert.Contains("'link501'", d.Message, StringComparison.Ordinal);
        Assert.Contains("500", d.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Frames_at_the_limit_bind_and_one_more_is_one_error_at_its_name()
    {
        var frames = Enumerable.Range(0, Limits.Frames).Select(i => $"frame f{i}").ToList();
        Assert.Equal(Limits.Frames, Compile.Clean(Lines(frames)).Frames.Count);
        var d = Single(Lines(frames.Append("frame extra")), LanguageDiagnosticCodes.TooManyFrames, Limits.Frames + 1, 7);
        Assert.Contains("10000", d.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Points_up_to_the_limit_bind_and_the_next_is_the_one_error_at_its_name()
    {
        // One spec of 100,001 points (binding it twice would double the cost): a single error, at the last one,
        // shows the first 100,000 bound clean.
        var points = new[] { "frame deck" }.Concat(Enumerable.Range(0, Limits.Points + 1).Select(i => $"point p{i} in deck at [0, 0, 0]"));
        var d = Single(Lines(points), LanguageDiagnosticCodes.TooManyPoints, Limits.Points + 2, 7);
        Assert.Contains("100001", d.Message, StringComparison.Ordinal);
        Assert.Contains("100000", d.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Reports_at_the_limit_bind_and_one_more_is_one_error_at_its_subject()
    {
        var reports = new[] { "frame deck", "frame boom in deck" }.Concat(Enumerable.Range(0, Limits.Reports).Select(i => $"report boom in deck as r{i}")).ToList();
        Assert.Equal(Limits.Reports, Compile.Clean(Lines(reports)).Reports.Count);
        var d = Single(Lines(reports.Append("report boom in deck as extra")), LanguageDiagnosticCodes.TooManyReports, Limits.Reports + 3, 8);
        Assert.Contains("1000", d.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Number_of_exactly_the_limit_length_binds_and_one_more_character_is_an_error_at_its_start()
    {
        var atLimit = "1." + new string('5', Limits.NumberLength - 2);
        Compile.Clean($"param a = {atLimit} m\n");
        var d = Single($"param b = 2\nparam a = {atLimit}5 m\n", LanguageDiagnosticCodes.NumberTooLong, 2, 11);
        Assert.Contains("1001", d.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Exponent_of_a_power_at_the_limit_binds_and_one_more_is_an_error_at_the_exponent()
    {
        Compile.Clean("param a = 1^1000\nparam b = 1^-1000\nparam c = 1^(1/1000)\n");
        Single("param a = 1^1001\n", LanguageDiagnosticCodes.ExponentTooLarge, 1, 13);
        Single("param a = 1^-1001\n", LanguageDiagnosticCodes.ExponentTooLarge, 1, 13);
        Single("param a = 1^(1/1001)\n", LanguageDiagnosticCodes.ExponentTooLarge, 1, 13);
    }

    [Fact]
    public void Exponent_in_a_unit_at_the_limit_binds_and_one_more_is_an_error_at_the_unit()
    {
        Compile.Clean("param a = 1 m^1000\n");
        Single("param a = 1 m^1001\n", LanguageDiagnosticCodes.ExponentTooLarge, 1, 13);
    }

    [Fact]
    public void File_of_exactly_16_MiB_is_read_and_one_byte_more_is_an_error_at_line_1_column_1()
    {
        var head = System.Text.Encoding.ASCII.GetBytes("frame quay\n#");
        var bytes = new byte[Limits.FileSizeBytes];
        Array.Fill(bytes, (byte)'x');
        head.CopyTo(bytes, 0);
        var bag = new DiagnosticBag();
        var source = FrontEnd.Decode("big.motion", bytes, bag);
        Assert.NotNull(source);
        Assert.NotNull(FrontEnd.Run(source!, bag));
        Assert.Empty(bag.Items);

        var over = new DiagnosticBag();
        Assert.Null(FrontEnd.Decode("big.motion", [.. bytes, (byte)'x'], over));
        var d = Assert.Single(over.Items);
        Assert.Equal(LanguageDiagnosticCodes.FileTooLarge, d.Code);
        Assert.Equal(new LinePosition(1, 1), d.Start);
        Assert.Contains("16 MiB", d.Message, StringComparison.Ordinal);
    }
}
