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
        Assert.Equal(string.Empty, run.Stdout);

        // The 257th parenthesis is the first beyond the limit: column 11 + 256.
        var line = Assert.Single(run.StderrLines);
        Assert.StartsWith(spec + "(1,267): error MOT1301: ", line, StringComparison.Ordinal);
        Assert.Contains("256", line, StringComparison.Ordinal);
    }

    [Fact]
    public void File_above_the_256_MiB_read_cap_is_not_read_at_all_exit_2()
    {
        var path = Path.Combine(_folder.Path, "disk.img");
        using (var file = new FileStream(path, FileMode.CreateNew))
        {
            // Sparse where the file system allows: no memory or disk is spent on it.
            file.SetLength(SpecFileLoader.ReadCapBytes + 1);
        }

        var run = CliRun.Of("check", path);

        Assert.Equal(ExitCodes.Usage, run.ExitCode);
        Assert.Equal($"motionspec: cannot read '{path}': the file is larger than 256 MiB; a spec is plain text and far smaller", Assert.Single(run.StderrLines));
    }

    [Fact]
    public void Plot_sweep_above_the_sample_limit_is_refused_naming_it_exit_2()
    {
        var spec = _folder.Write("slide.motion", Specs.Clean);
        var image = Path.Combine(_folder.Path, "slide.svg");

        var run = CliRun.Of("plot", spec, "--t", "0:1ms:1000s", "-o", image);

        // 0 to 1000 s in 1 ms steps is 1,000,001 samples, one above the limit.
        Assert.Equal(ExitCodes.Usage, run.ExitCode);
        Assert.Equal(
            "motionspec plot: --t '0:1ms:1000s': the sweep has 1000001 samples, more than the limit of 1000000 samples per sweep",
            Assert.Single(run.StderrLines));
        Assert.False(File.Exists(image));
    }

    [Fact]
    public void Sweep_limit_of_the_command_line_is_the_documented_one()
    {
        Assert.Equal(MotionSpec.Language.Limits.SweepSamples, MotionSpec.Evaluation.EvaluationLimits.MaxSamples);
    }
}
