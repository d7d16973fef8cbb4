using System.Diagnostics;

namespace MotionSpec.Cli.Tests;

/// <summary>
/// A few runs of the real executable, for what in-process runs cannot see: the exit code the operating
/// system gets, and standard output being flushed before the process ends.
/// </summary>
public sealed class ProcessTests : IDisposable
{
    private readonly TempFolder _folder = new();

    public void Dispose() => _folder.Dispose();

    private static CliRun Execute(params string[] args)
    {
        var dotnet = Environment.GetEnvironmentVariable("DOTNET_HOST_PATH");
        var start = new ProcessStartInfo(string.IsNullOrEmpty(dotnet) ? "dotnet" : dotnet)
        {
            RedirectStandardOutput = true,
            RedirectStandardError = true,
            UseShellExecute = false,
        };
        start.ArgumentList.Add(Path.Combine(AppContext.BaseDirectory, "motionspec.dll"));
        foreach (var arg in args)
        {
            start.ArgumentList.Add(arg);
        }

        using var process = Process.Start(start)!;
        var stdout = process.StandardOutput.ReadToEndAsync();
        var stderr = process.StandardError.ReadToEndAsync();
        Assert.True(process.WaitForExit(60_000), "motionspec did not finish");
        return new CliRun(process.ExitCode, stdout.Result, stderr.Result);
    }

    [Fact]
    public void Help_reaches_stdout_of_the_process_with_exit_0()
    {
        var run = Execute("eval", "--help");

        Assert.Equal(0, run.ExitCode);
        Assert.Contains("--format <table|csv|json>", run.Stdout, StringComparison.Ordinal);
    }

    [Fact]
    public void Spec_errors_give_exit_1_and_compiler_lines_on_stderr()
    {
        var spec = _folder.Write("crane.motion", Specs.UnknownFrame);

        var run = Execute("check", spec);

        Assert.Equal(1, run.ExitCode);
        Assert.Equal(string.Empty, run.Stdout);
        Assert.StartsWith(spec + "(4,16): error MOT2203: ", run.Stderr, StringComparison.Ordinal);
    }

    [Fact]
    public void Unknown_option_gives_exit_2()
    {
        var run = Execute("check", "--no-such-option", "x.motion");

        Assert.Equal(2, run.ExitCode);
        Assert.Equal(string.Empty, run.Stdout);
    }
}
