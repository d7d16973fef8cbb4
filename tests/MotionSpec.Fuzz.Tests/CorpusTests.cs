namespace MotionSpec.Fuzz.Tests;

/// <summary>The seed corpus goes through the same target the fuzzer runs, and reaches the stages it is meant to.</summary>
public class CorpusTests
{
    // Seeds that are wrong on purpose, so that mutations start near the error paths too.
    private static readonly Dictionary<string, string[]> ExpectedCodes = new(StringComparer.Ordinal)
    {
        ["errors.motion"] = ["MOT3002", "MOT2203", "MOT2204", "MOT1201"],
        ["not-finite.motion"] = ["MOT5001"],
        ["powers.motion"] = ["MOT5104"],
    };

    public static TheoryData<string> Seeds => new(FuzzFiles.Inputs(FuzzFiles.Corpus));

    [Theory]
    [MemberData(nameof(Seeds))]
    public void Seed_runs_through_the_target(string name)
    {
        var outcome = SpecFuzzTarget.Run(File.ReadAllBytes(Path.Combine(FuzzFiles.Corpus, name)));

        if (ExpectedCodes.TryGetValue(name, out var codes))
        {
            Assert.Equal(codes, outcome.Codes);
        }
        else
        {
            // A clean seed that stopped at the checker would leave eval, emit and derive unfuzzed.
            Assert.Empty(outcome.Codes);
            Assert.Equal(FuzzStage.BackEnd, outcome.LastStage);
        }
    }

    [Fact]
    public void Corpus_holds_every_demo_spec_unchanged()
    {
        var demos = Path.Combine(FuzzFiles.FuzzFolder, "..", "..", "specs-demo");
        foreach (var demo in Directory.GetFiles(demos, "*.motion"))
        {
            var seed = Path.Combine(FuzzFiles.Corpus, Path.GetFileName(demo));
            Assert.True(File.Exists(seed), $"{Path.GetFileName(demo)} is missing from the corpus");
            Assert.Equal(File.ReadAllBytes(demo), File.ReadAllBytes(seed));
        }
    }

    [Fact]
    public void A_clean_model_beyond_the_back_end_bound_stops_at_the_checker()
    {
        var frames = string.Concat(Enumerable.Range(1, SpecFuzzTarget.MaxBackEndFrames)
            .Select(i => $"frame f{i} in f{i - 1} {{ origin at [1 m, 0, 0] }}\n"));
        var spec = "frame f0\n" + frames + "point p in f1 at [0, 0, 0]\nreport p in f0\n";

        var outcome = SpecFuzzTarget.Run(System.Text.Encoding.UTF8.GetBytes(spec));

        Assert.Empty(outcome.Codes);
        Assert.Equal(FuzzStage.Check, outcome.LastStage);
    }

    [Fact]
    public void The_same_model_one_frame_smaller_reaches_the_back_end()
    {
        var frames = string.Concat(Enumerable.Range(1, SpecFuzzTarget.MaxBackEndFrames - 1)
            .Select(i => $"frame f{i} in f{i - 1} {{ origin at [1 m, 0, 0] }}\n"));
        var spec = "frame f0\n" + frames + "point p in f1 at [0, 0, 0]\nreport p in f0\n";

        var outcome = SpecFuzzTarget.Run(System.Text.Encoding.UTF8.GetBytes(spec));

        Assert.Empty(outcome.Codes);
        Assert.Equal(FuzzStage.BackEnd, outcome.LastStage);
    }
}
