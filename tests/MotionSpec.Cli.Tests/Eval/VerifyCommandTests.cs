namespace MotionSpec.Cli.Tests.Eval;

public sealed class VerifyCommandTests : IDisposable
{
    private readonly TempFolder _folder = new();

    public void Dispose() => _folder.Dispose();

    [Fact]
    public void DemoSpecAgreesAndPrintsOneLinePerReport()
    {
        var path = Path.Combine(RepoRoot.Find(), "specs-demo", "swing-bucket-centrifuge.motion");
        var run = CliRun.Of("verify", path);
        Assert.Equal(0, run.ExitCode);
        Assert.Contains("pelletInLab", run.Stdout, StringComparison.Ordinal);
        Assert.Contains("agree within 1E-06", run.Stdout, StringComparison.Ordinal);
    }

    [Fact]
    public void SpecWithErrorsExitsOne()
    {
        var path = _folder.Write("bad.motion", "frame a\nreport nothing in a\n");
        var run = CliRun.Of("verify", path);
        Assert.Equal(1, run.ExitCode);
        Assert.Equal(string.Empty, run.Stdout);
    }

    [Fact]
    public void MissingFileExitsTwo() => Assert.Equal(2, CliRun.Of("verify", Path.Combine(_folder.Path, "none.motion")).ExitCode);
}
