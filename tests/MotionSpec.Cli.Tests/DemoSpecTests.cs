namespace MotionSpec.Cli.Tests;

/// <summary>Every spec shipped in specs-demo checks with no diagnostics at all, warnings included.</summary>
public sealed class DemoSpecTests
{
    private static List<string> DemoSpecNames() =>
        Directory.GetFiles(Path.Combine(RepoRoot.Find(), "specs-demo"), "*.motion")
            .Select(Path.GetFileName)
            .OfType<string>()
            .Order(StringComparer.Ordinal)
            .ToList();

    public static TheoryData<string> DemoSpecs() => new(DemoSpecNames());

    [Fact]
    public void There_are_at_least_five_demo_specs_in_kebab_case()
    {
        var names = DemoSpecNames();

        Assert.True(names.Count >= 5, $"{names.Count} demo specs");
        Assert.All(names, n => Assert.Matches("^[a-z0-9]+(-[a-z0-9]+)*\\.motion$", n));
    }

    [Theory]
    [MemberData(nameof(DemoSpecs))]
    public void Demo_spec_checks_clean(string name)
    {
        var path = Path.Combine(RepoRoot.Find(), "specs-demo", name);

        var run = CliRun.Of("check", path);

        Assert.Equal(string.Empty, run.Stderr);
        Assert.Equal(ExitCodes.Success, run.ExitCode);
    }
}
