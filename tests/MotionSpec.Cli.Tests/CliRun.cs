namespace MotionSpec.Cli.Tests;

/// <summary>What one in-process run of the command printed and returned.</summary>
internal sealed record CliRun(int ExitCode, string Stdout, string Stderr)
{
    /// <summary>The non-empty lines of standard error.</summary>
    public string[] StderrLines => Stderr.Split('\n', StringSplitOptions.RemoveEmptyEntries | StringSplitOptions.TrimEntries);

    /// <summary>Runs <c>motionspec</c> with <paramref name="args"/> through the same entry as the process.</summary>
    public static CliRun Of(params string[] args)
    {
        using var stdout = new StringWriter();
        using var stderr = new StringWriter();
        var exitCode = Program.Run(args, stdout, stderr);
        return new CliRun(exitCode, stdout.ToString(), stderr.ToString());
    }
}
