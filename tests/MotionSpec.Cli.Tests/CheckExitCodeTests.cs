namespace MotionSpec.Cli.Tests;

/// <summary>Exit codes of <c>check</c>: 0 clean, 1 spec errors, 2 a wrong command line (CLI.md).</summary>
public sealed class CheckExitCodeTests : IDisposable
{
    private readonly TempFolder _folder = new();

    public void Dispose() => _folder.Dispose();

    [Fact]
    public void Clean_spec_exits_0_and_prints_nothing()
    {
        var spec = _folder.Write("turntable.motion", Specs.Clean);

        var run = CliRun.Of("check", spec);

        Assert.Equal(ExitCodes.Success, run.ExitCode);
        Assert.Equal(string.Empty, run.Stdout);
        Assert.Equal(string.Empty, run.Stderr);
    }

    [Fact]
    public void Spec_with_errors_exits_1_and_keeps_stdout_empty()
    {
        var spec = _folder.Write("crane.motion", Specs.UnknownFrame);

        var run = CliRun.Of("check", spec);

        Assert.Equal(ExitCodes.SpecErrors, run.ExitCode);
        Assert.Equal(string.Empty, run.Stdout);
        Assert.NotEmpty(run.StderrLines);
    }

    [Fact]
    public void Missing_file_exits_2_naming_the_path_as_written()
    {
        var run = CliRun.Of("check", "no/such/crane.motion");

        Assert.Equal(ExitCodes.Usage, run.ExitCode);
        Assert.Equal(string.Empty, run.Stdout);
        var line = Assert.Single(run.StderrLines);
        Assert.Contains("'no/such/crane.motion'", line, StringComparison.Ordinal);
    }

    [Fact]
    public void Missing_file_among_good_ones_exits_2_and_checks_nothing()
    {
        // Decided: an unreadable file stops the run before any check, so stderr holds only the reasons.
        var bad = _folder.Write("bad.motion", Specs.UnknownFrame);
        var missing = Path.Combine(_folder.Path, "gone.motion");

        var run = CliRun.Of("check", bad, missing);

        Assert.Equal(ExitCodes.Usage, run.ExitCode);
        var line = Assert.Single(run.StderrLines);
        Assert.Equal($"motionspec: cannot read '{missing}': no such file", line);
    }

    [Fact]
    public void Every_unreadable_file_is_named()
    {
        var run = CliRun.Of("check", "a-missing.motion", _folder.Path, "b-missing.motion");

        Assert.Equal(ExitCodes.Usage, run.ExitCode);
        Assert.Equal(3, run.StderrLines.Length);
        Assert.Contains("'a-missing.motion'", run.StderrLines[0], StringComparison.Ordinal);
        Assert.Contains("directory", run.StderrLines[1], StringComparison.Ordinal);
        Assert.Contains("'b-missing.motion'", run.StderrLines[2], StringComparison.Ordinal);
    }

    [Fact]
    public void Unknown_option_exits_2_even_beside_a_good_file()
    {
        var spec = _folder.Write("turntable.motion", Specs.Clean);

        var run = CliRun.Of("check", "--bogus", spec);

        Assert.Equal(ExitCodes.Usage, run.ExitCode);
        Assert.Equal(string.Empty, run.Stdout);
        Assert.Contains("'--bogus'", run.Stderr, StringComparison.Ordinal);
    }

    [Fact]
    public void Unknown_diagnostics_format_exits_2()
    {
        var spec = _folder.Write("turntable.motion", Specs.Clean);

        var run = CliRun.Of("check", "--diagnostics", "xml", spec);

        Assert.Equal(ExitCodes.Usage, run.ExitCode);
        Assert.Contains("'xml'", run.Stderr, StringComparison.Ordinal);
    }

    [Fact]
    public void Check_without_a_file_exits_2()
    {
        var run = CliRun.Of("check");

        Assert.Equal(ExitCodes.Usage, run.ExitCode);
        Assert.Equal(string.Empty, run.Stdout);
    }

    [Theory]
    [InlineData]
    [InlineData("chekc", "x.motion")]
    public void No_or_unknown_command_exits_2_with_stdout_empty(params string[] args)
    {
        var run = CliRun.Of(args);

        Assert.Equal(ExitCodes.Usage, run.ExitCode);
        Assert.Equal(string.Empty, run.Stdout);
        Assert.NotEmpty(run.StderrLines);
    }

    [Fact]
    public void File_name_starting_with_at_sign_is_a_file_not_a_response_file()
    {
        var spec = _folder.Write("@turntable.motion", Specs.Clean);

        var run = CliRun.Of("check", spec);

        Assert.Equal(ExitCodes.Success, run.ExitCode);
    }

    [Fact]
    public void Several_files_each_report_their_own_diagnostics_in_order()
    {
        var clean = _folder.Write("a-clean.motion", Specs.Clean);
        var bad = _folder.Write("b-bad.motion", Specs.UnknownFrame);
        var worse = _folder.Write("c-worse.motion", Specs.TwoErrors);

        var run = CliRun.Of("check", clean, bad, worse);

        Assert.Equal(ExitCodes.SpecErrors, run.ExitCode);
        Assert.DoesNotContain(run.StderrLines, l => l.StartsWith(clean, StringComparison.Ordinal));
        Assert.StartsWith(bad + "(4,16): error MOT2203: ", run.StderrLines[0], StringComparison.Ordinal);
        Assert.StartsWith(worse + "(2,7): error MOT2202: ", run.StderrLines[1], StringComparison.Ordinal);
        Assert.StartsWith(worse + "(3,13): error MOT3001: ", run.StderrLines[2], StringComparison.Ordinal);
        Assert.Equal(3, run.StderrLines.Length);
    }
}
