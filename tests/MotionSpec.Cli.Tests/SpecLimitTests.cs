using System.Text;

namespace MotionSpec.Cli.Tests;

/// <summary>Limits reach the user as located diagnostics (LANGUAGE.md: a spec beyond a limit is an error naming it).</summary>
public sealed class SpecLimitTests : IDisposable
{
    private readonly TempFolder _folder = new();

    public void Dispose() => _folder.Dispose();

    [Fact]
    public void File_above_16_MiB_is_a_MOT1002_error_at_the_start_exit_1()
    {
        // A valid spec padded with a comment to one byte over 16 MiB.
        var head = Encoding.UTF8.GetBytes("frame quay\n#");
        var bytes = new byte[(16 * 1024 * 1024) + 1];
        Array.Fill(bytes, (byte)'x');
        head.CopyTo(bytes, 0);
        var spec = _folder.WriteBytes("huge.motion", bytes);

        var run = CliRun.Of("check", spec);

        Assert.Equal(ExitCodes.SpecErrors, run.ExitCode);
        var line = Assert.Single(run.StderrLines);
        Assert.StartsWith(spec + "(1,1): error MOT1002: ", line, StringComparison.Ordinal);
        Assert.Contains("16 MiB", line, StringComparison.Ordinal);
    }

    [Fact]
    public void Nesting_beyond_the_limit_is_an_error_not_a_crash()
    {
        var deep = new string('(', 5000) + "1" + new string(')', 5000);
        var spec = _folder.Write("deep.motion", $"param k = {deep}\n");

        var run = CliRun.Of("check", spec);

        Assert.Equal(ExitCodes.SpecErrors, run.ExitCode);
        Assert.StartsWith(spec + "(1,", run.StderrLines[0], StringComparison.Ordinal);
        Assert.Contains(": error MOT1301: ", run.StderrLines[0], StringComparison.Ordinal);
    }
}
