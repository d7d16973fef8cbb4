namespace MotionSpec.Cli.Tests;

/// <summary>
/// The option sets of the commands: the contract's spellings parse and the command goes on to read its file
/// (missing here, so exit 2 from the loader), while a wrong value or option is a command-line error (exit 2)
/// before any file is read.
/// </summary>
public sealed class CommandOptionTests
{
    [Theory]
    [InlineData("eval", "x.motion", "--report", "a", "--report", "b", "--t", "0:100ms:2s", "--set", "psi'=10 deg/s", "--format", "csv")]
    [InlineData("eval", "x.motion", "--t", "-1:0.5:1", "--format", "json")]
    [InlineData("emit", "x.motion", "-o", "Out.cs", "--namespace", "Plant.Kinematics", "--class", "Crane", "--float", "--stats")]
    [InlineData("derive", "x.motion", "-o", "out.md", "--format", "latex")]
    [InlineData("plot", "x.motion", "--report", "tipInQuay", "--t", "0:0.1:5", "--set", "L=20 m", "-o", "out.svg")]
    [InlineData("verify", "x.motion")]
    public void Contract_command_lines_parse_and_reach_the_file_loader(params string[] args)
    {
        var run = CliRun.Of(args);

        Assert.Equal(ExitCodes.Usage, run.ExitCode);
        Assert.StartsWith("motionspec: cannot read 'x.motion'", Assert.Single(run.StderrLines), StringComparison.Ordinal);
        Assert.Equal(string.Empty, run.Stdout);
    }

    [Theory]
    [InlineData("eval", "x.motion", "--format", "xml")]
    [InlineData("derive", "x.motion", "--format", "html")]
    [InlineData("plot", "x.motion")]
    [InlineData("eval", "x.motion", "--report")]
    [InlineData("eval", "x.motion", "--frobnicate")]
    [InlineData("emit")]
    [InlineData("verify", "a.motion", "b.motion")]
    public void Wrong_command_lines_exit_2_with_a_message_and_nothing_on_stdout(params string[] args)
    {
        var run = CliRun.Of(args);

        Assert.Equal(ExitCodes.Usage, run.ExitCode);
        Assert.DoesNotContain("cannot read", run.Stderr, StringComparison.Ordinal);
        Assert.NotEmpty(run.StderrLines);
        Assert.Equal(string.Empty, run.Stdout);
    }
}
