using System.Globalization;
using System.Text.Json;

namespace MotionSpec.Cli.Tests.Eval;

public sealed class EvalCommandTests : IDisposable
{
    private const string Disc = "title \"Turntable\"\n" +
        "param r = 25 cm\n" +
        "param d = 2 * r\n" +
        "coord theta : angle\n" +
        "frame ground\n" +
        "frame disc in ground {\n" +
        "    rotate about z by theta\n" +
        "}\n" +
        "point rim in disc at [r, 0, 0]\n" +
        "point axle in disc at [r / theta, 0, 0]\n" +
        "report disc in ground\n" +
        "report rim in ground basis disc\n" +
        "   report axle in ground\n";

    private readonly TempFolder _folder = new();
    private readonly string _spec;

    public EvalCommandTests() => _spec = _folder.Write("disc.motion", Disc);

    public void Dispose() => _folder.Dispose();

    private CliRun Eval(params string[] args) => CliRun.Of(["eval", _spec, .. args]);

    [Fact]
    public void JsonCarriesTheTurningDiscAccelerationAndKeepsFileOrder()
    {
        var run = Eval("--format", "json", "--report", "rimInGroundBasisDisc", "--report", "discInGround", "--set", "theta=1", "--set", "theta'=3", "--set", "theta''=-2");
        Assert.Equal(0, run.ExitCode);
        Assert.Equal(string.Empty, run.Stderr);
        var root = JsonDocument.Parse(run.Stdout).RootElement;
        Assert.Equal("Turntable", root.GetProperty("spec").GetString());
        var reports = root.GetProperty("reports").EnumerateArray().ToArray();
        Assert.Equal(["discInGround", "rimInGroundBasisDisc"], reports.Select(r => r.GetProperty("name").GetString()));

        // A point on a disc turning at w with angular acceleration alpha: -w^2 r radially, alpha r
        // tangentially (common practice); here w = 3 rad/s, alpha = -2 rad/s^2, r = 0.25 m.
        var a = reports[1].GetProperty("samples")[0].GetProperty("acceleration").EnumerateArray().Select(e => e.GetDouble()).ToArray();
        Assert.Equal(-2.25, a[0], 12);
        Assert.Equal(-0.5, a[1], 12);
    }

    [Fact]
    public void SpecNameIsTheFileBaseNameWithoutATitle()
    {
        var path = _folder.Write("bare-disc.motion", Disc.Replace("title \"Turntable\"\n", string.Empty, StringComparison.Ordinal));
        var run = CliRun.Of("eval", path, "--format", "json", "--report", "discInGround");
        Assert.Equal(0, run.ExitCode);
        Assert.Equal("bare-disc", JsonDocument.Parse(run.Stdout).RootElement.GetProperty("spec").GetString());
    }

    [Fact]
    public void CsvSweepHasOneRowPerReportAndInstant()
    {
        var run = Eval("--format", "csv", "--t", "0:250ms:1s", "--set", "theta=0.5", "--set", "theta'=1 rpm");
        Assert.Equal(0, run.ExitCode);
        var lines = run.Stdout.Split('\n', StringSplitOptions.RemoveEmptyEntries);
        Assert.StartsWith("report,t,position.x,", lines[0], StringComparison.Ordinal);
        Assert.Equal(1 + (3 * 5), lines.Length);
        Assert.Equal(["0", "0.25", "0.5", "0.75", "1"], lines.Skip(1).Take(5).Select(l => l.Split(',')[1]));
    }

    [Fact]
    public void NonFiniteValueIsMot5AtTheReportWithEmptyStdout()
    {
        // theta holds at the start of the sweep and moves at 1 rad/s: r / theta is infinite at t = 0.
        var run = Eval("--t", "-1:0.5:1", "--set", "theta=-1", "--set", "theta'=1", "--format", "csv");
        Assert.Equal(1, run.ExitCode);
        Assert.Equal(string.Empty, run.Stdout);
        var line = Assert.Single(run.StderrLines);
        Assert.StartsWith($"{_spec}(13,4): error MOT5001: report 'axleInGround'", line, StringComparison.Ordinal);
        Assert.Contains("t = 0 s", line, StringComparison.Ordinal);
    }

    [Fact]
    public void NonFiniteValueInJsonDiagnosticsIsOneArray()
    {
        var run = Eval("--diagnostics", "json");
        Assert.Equal(1, run.ExitCode);
        Assert.Equal(string.Empty, run.Stdout);
        var array = JsonDocument.Parse(run.Stderr).RootElement;
        var item = Assert.Single(array.EnumerateArray());
        Assert.Equal("MOT5001", item.GetProperty("code").GetString());
        Assert.Equal((13, 4), (item.GetProperty("line").GetInt32(), item.GetProperty("column").GetInt32()));
    }

    [Theory]
    [InlineData("--report", "rimInGround")]
    [InlineData("--t", "0:0:1")]
    [InlineData("--t", "1:0.1:0")]
    [InlineData("--t", "0:1us:1")]
    [InlineData("--t", "3 m")]
    [InlineData("--set", "thetta=1")]
    [InlineData("--set", "d=1")]
    [InlineData("--set", "r=1 rad/s")]
    [InlineData("--set", "theta'=2 m/s")]
    [InlineData("--set", "theta")]
    [InlineData("--format", "xml")]
    public void BadCommandLineExitsTwoWithNothingOnStdout(string option, string value)
    {
        var run = Eval(option, value);
        Assert.Equal(2, run.ExitCode);
        Assert.Equal(string.Empty, run.Stdout);
        Assert.NotEmpty(run.StderrLines);
    }

    [Fact]
    public void SweepAboveTheLimitNamesIt()
    {
        var run = Eval("--t", "0:1ms:2000s");
        Assert.Equal(2, run.ExitCode);
        Assert.Contains("1000000", run.Stderr, StringComparison.Ordinal);
    }

    [Fact]
    public void DerivedParamFollowsItsOverride()
    {
        var run = Eval("--format", "csv", "--report", "rimInGroundBasisDisc", "--set", "r=2 m");
        Assert.Equal(0, run.ExitCode);
        var row = run.Stdout.Split('\n')[1].Split(',');
        Assert.Equal(2.0, double.Parse(row[2], CultureInfo.InvariantCulture));
    }

    [Fact]
    public void MissingFileExitsTwo() => Assert.Equal(2, CliRun.Of("eval", Path.Combine(_folder.Path, "none.motion")).ExitCode);

    [Fact]
    public void SpecWithErrorsExitsOne()
    {
        var path = _folder.Write("bad.motion", "frame a\nreport nothing in a\n");
        var run = CliRun.Of("eval", path);
        Assert.Equal(1, run.ExitCode);
        Assert.Equal(string.Empty, run.Stdout);
    }
}
