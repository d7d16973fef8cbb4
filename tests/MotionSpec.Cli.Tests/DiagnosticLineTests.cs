using System.Text;
using System.Text.RegularExpressions;

namespace MotionSpec.Cli.Tests;

/// <summary>
/// The text form `path(line,col): severity CODE: message` that editors and build logs parse (the convention
/// of command-line compilers, common practice), driven through the real front end.
/// </summary>
public sealed partial class DiagnosticLineTests : IDisposable
{
    private readonly TempFolder _folder = new();

    public void Dispose() => _folder.Dispose();

    [GeneratedRegex(@"^(?<path>.+)\((?<line>\d+),(?<col>\d+)\): (?<severity>error|warning) (?<code>MOT\d{4}): (?<message>.+)$")]
    private static partial Regex CompilerLine();

    [Fact]
    public void Unknown_frame_is_one_line_at_the_misspelt_name_with_the_close_name_suggested()
    {
        var spec = _folder.Write("crane.motion", Specs.UnknownFrame);

        var run = CliRun.Of("check", spec);

        var line = Assert.Single(run.StderrLines);
        var match = CompilerLine().Match(line);
        Assert.True(match.Success, line);
        Assert.Equal(spec, match.Groups["path"].Value);
        Assert.Equal("4", match.Groups["line"].Value);
        Assert.Equal("16", match.Groups["col"].Value);
        Assert.Equal("error", match.Groups["severity"].Value);
        Assert.Equal("MOT2203", match.Groups["code"].Value);
        Assert.Contains("'trolley'", match.Groups["message"].Value, StringComparison.Ordinal);
    }

    [Fact]
    public void Path_is_printed_exactly_as_the_user_wrote_it()
    {
        Directory.CreateDirectory(Path.Combine(_folder.Path, "sub"));
        _folder.Write("crane.motion", Specs.UnknownFrame);
        var asWritten = Path.Combine(_folder.Path, "sub", "..", ".", "crane.motion");

        var run = CliRun.Of("check", asWritten);

        Assert.StartsWith(asWritten + "(4,16): error ", Assert.Single(run.StderrLines), StringComparison.Ordinal);
    }

    [Fact]
    public void Columns_count_a_tab_as_one_and_skip_a_byte_order_mark()
    {
        // LANGUAGE.md: a leading byte-order mark is skipped; CLI.md: it is not counted, and a tab is one column.
        var text = Specs.UnknownFrame.Replace("report hook in trolly", "report\thook in trolly", StringComparison.Ordinal);
        var bytes = Encoding.UTF8.GetPreamble().Concat(new UTF8Encoding(false).GetBytes(text)).ToArray();
        var spec = _folder.WriteBytes("crane.motion", bytes);

        var run = CliRun.Of("check", spec);

        Assert.StartsWith(spec + "(4,16): error MOT2203: ", Assert.Single(run.StderrLines), StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("\r\n")]
    [InlineData("\r")]
    [InlineData("\n")]
    public void Every_line_end_style_counts_one_line(string lineEnd)
    {
        var text = Specs.UnknownFrame.ReplaceLineEndings(lineEnd);
        var spec = _folder.Write("crane.motion", text);

        var run = CliRun.Of("check", spec);

        Assert.StartsWith(spec + "(4,16): ", Assert.Single(run.StderrLines), StringComparison.Ordinal);
    }

    [Fact]
    public void Non_ascii_letters_in_a_comment_count_one_column_each()
    {
        // 'é' is two UTF-8 bytes and '𝛚' is a surrogate pair in UTF-16; each is one Unicode scalar value.
        var text = "frame quay # é𝛚\nframe trolley in quay\npoint hook in trolley at [0, 0, -5 m]\n# 𝛚é\treport\nreport hook in trolly\n";
        var spec = _folder.Write("crane.motion", text);

        var run = CliRun.Of("check", spec);

        Assert.StartsWith(spec + "(5,16): error MOT2203: ", Assert.Single(run.StderrLines), StringComparison.Ordinal);
    }
}
