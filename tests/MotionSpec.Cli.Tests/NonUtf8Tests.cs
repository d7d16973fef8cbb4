using System.Text;

namespace MotionSpec.Cli.Tests;

/// <summary>CLI.md: a file that is not UTF-8 is a MOT1 error at the first bad byte, exit 1.</summary>
public sealed class NonUtf8Tests : IDisposable
{
    private readonly TempFolder _folder = new();

    public void Dispose() => _folder.Dispose();

    private static byte[] Bytes(string before, byte[] bad, string after) =>
        [.. Encoding.UTF8.GetBytes(before), .. bad, .. Encoding.UTF8.GetBytes(after)];

    [Fact]
    public void Latin1_byte_in_a_comment_is_reported_at_its_line_and_column()
    {
        // 0xE9 is 'é' in ISO 8859-1; followed by a space it is not a valid UTF-8 sequence (RFC 3629).
        var bytes = Bytes("frame quay\nparam L = 2 m # caf", [0xE9], " au lait\n");
        var spec = _folder.WriteBytes("latin1.motion", bytes);

        var run = CliRun.Of("check", spec);

        Assert.Equal(ExitCodes.SpecErrors, run.ExitCode);
        Assert.StartsWith(spec + "(2,20): error MOT1001: ", run.StderrLines[0], StringComparison.Ordinal);
    }

    [Fact]
    public void Only_the_first_bad_byte_counts_and_valid_multibyte_text_before_it_is_one_column_per_letter()
    {
        // "ü" (2 bytes) and "€" (3 bytes) are valid UTF-8; 0xFF never occurs in UTF-8 (RFC 3629).
        var bytes = Bytes("# üü€ ", [0xFF], " and again ");
        bytes = [.. bytes, 0xFE, (byte)'\n'];
        var spec = _folder.WriteBytes("mixed.motion", bytes);

        var run = CliRun.Of("check", "--diagnostics", "json", spec);

        Assert.Equal(ExitCodes.SpecErrors, run.ExitCode);
        using var json = System.Text.Json.JsonDocument.Parse(run.Stderr);
        var first = json.RootElement[0];
        Assert.Equal(1, first.GetProperty("line").GetInt32());
        Assert.Equal(7, first.GetProperty("column").GetInt32());
        Assert.Equal("MOT1001", first.GetProperty("code").GetString());
    }

    [Fact]
    public void Byte_order_mark_is_not_counted_before_a_bad_byte()
    {
        var bytes = Bytes("\uFEFF# x", [0xC3], "(\n");
        var spec = _folder.WriteBytes("bom.motion", bytes);

        var run = CliRun.Of("check", spec);

        Assert.Equal(ExitCodes.SpecErrors, run.ExitCode);
        Assert.StartsWith(spec + "(1,4): error MOT1001: ", run.StderrLines[0], StringComparison.Ordinal);
    }
}
