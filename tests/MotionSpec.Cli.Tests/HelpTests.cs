namespace MotionSpec.Cli.Tests;

/// <summary>CLI.md: <c>--help</c> works on every command.</summary>
public sealed class HelpTests
{
    public static TheoryData<string[]> HelpCommandLines => new()
    {
        new[] { "--help" },
        new[] { "check", "--help" },
        new[] { "eval", "--help" },
        new[] { "emit", "--help" },
        new[] { "derive", "--help" },
        new[] { "plot", "--help" },
        new[] { "verify", "--help" },
        new[] { "check", "-h" },
    };

    [Theory]
    [MemberData(nameof(HelpCommandLines))]
    public void Help_exits_0_and_prints_usage_on_stdout(string[] args)
    {
        var run = CliRun.Of(args);

        Assert.Equal(ExitCodes.Success, run.ExitCode);
        Assert.Contains("Usage:", run.Stdout, StringComparison.Ordinal);
        Assert.Equal(string.Empty, run.Stderr);
    }

    [Theory]
    [InlineData("eval", "--report", "--t", "--set", "--format", "--diagnostics")]
    [InlineData("emit", "-o", "--namespace", "--class", "--float", "--stats", "--diagnostics")]
    [InlineData("derive", "-o", "--format", "--diagnostics")]
    [InlineData("plot", "--report", "--t", "--set", "-o", "--diagnostics")]
    [InlineData("verify", "--diagnostics")]
    [InlineData("check", "--diagnostics")]
    public void Help_lists_the_options_of_the_contract(string command, params string[] options)
    {
        var run = CliRun.Of(command, "--help");

        foreach (var option in options)
        {
            Assert.Matches("(^|[ ,])" + System.Text.RegularExpressions.Regex.Escape(option) + "[ ,]", run.Stdout);
        }
    }

    [Fact]
    public void Root_help_lists_every_command()
    {
        var run = CliRun.Of("--help");

        foreach (var command in new[] { "check", "eval", "emit", "derive", "plot", "verify" })
        {
            Assert.Contains("  " + command + " ", run.Stdout, StringComparison.Ordinal);
        }
    }
}
