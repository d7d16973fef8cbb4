namespace MotionSpec.Cli.Tests;

/// <summary>The example spec in the README's language tour is real: it checks clean.</summary>
public sealed class ReadmeExampleTests : IDisposable
{
    private readonly TempFolder _folder = new();

    public void Dispose() => _folder.Dispose();

    [Fact]
    public void Language_tour_example_checks_clean()
    {
        var readme = File.ReadAllText(Path.Combine(RepoRoot.Find(), "README.md"));
        var tour = readme.IndexOf("## The language", StringComparison.Ordinal);
        Assert.True(tour >= 0, "README has no language tour");
        var open = readme.IndexOf("```\n", tour, StringComparison.Ordinal) + 4;
        var close = readme.IndexOf("```", open, StringComparison.Ordinal);
        var spec = _folder.Write("tour.motion", readme[open..close]);

        var run = CliRun.Of("check", spec);

        Assert.Contains("report ", File.ReadAllText(spec), StringComparison.Ordinal);
        Assert.Equal(string.Empty, run.Stderr);
        Assert.Equal(ExitCodes.Success, run.ExitCode);
    }
}
