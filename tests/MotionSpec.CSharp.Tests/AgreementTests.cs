namespace MotionSpec.CSharp.Tests;

/// <summary>
/// Every demo spec and a set of random frame trees: the emitted C#, compiled and run, agrees with the symbolic
/// engine's direct evaluation of the kinematic model (an independent path: no CSE, printing or C#) at random
/// states, to 1e-12 in CLI.md's error measure, and to 1e-4 for the float variant.
/// </summary>
public class AgreementTests
{
    public static TheoryData<string> DemoSpecs() => new(RepoRoot.DemoSpecs().Select(Path.GetFileName)!);

    [Theory]
    [MemberData(nameof(DemoSpecs))]
    public void A_demo_spec_evaluates_as_the_model_says(string file)
    {
        var path = Path.Combine(RepoRoot.Path, "specs-demo", file);
        var text = File.ReadAllText(path);
        AssertAgreement(path, text, useFloat: false, tolerance: 1e-12, seed: file.Length);
        AssertAgreement(path, text, useFloat: true, tolerance: 1e-4, seed: file.Length);
    }

    [Theory]
    [InlineData(1)]
    [InlineData(2)]
    [InlineData(3)]
    [InlineData(4)]
    [InlineData(5)]
    [InlineData(6)]
    public void A_random_frame_tree_evaluates_as_the_model_says(int seed) =>
        AssertAgreement($"tree{seed}.motion", RandomSpecs.Text(seed), useFloat: false, tolerance: 1e-12, seed);

    [Fact]
    public void Demo_specs_are_there_to_test()
    {
        Assert.True(RepoRoot.DemoSpecs().Count() >= 3);
    }

    internal static void AssertAgreement(string path, string text, bool useFloat, double tolerance, int seed)
    {
        var evaluator = LoadedEvaluator.From(path, text, new CSharpEmitOptions(UseFloat: useFloat));
        var random = new Random(seed);
        var coords = evaluator.Spec.Model!.Spec.Coords.Count;
        var checkedSamples = 0;
        for (var sample = 0; sample < 12; sample++)
        {
            var t = (random.NextDouble() * 20) - 10;
            var state = new double[coords, 3];
            for (var i = 0; i < coords; i++)
            {
                state[i, 0] = (random.NextDouble() * 6) - 3;
                state[i, 1] = (random.NextDouble() * 4) - 2;
                state[i, 2] = (random.NextDouble() * 4) - 2;
            }

            for (var report = 0; report < evaluator.Spec.Model.Reports.Count; report++)
            {
                var expected = ReferenceValues.Evaluate(evaluator.Spec, report, t, state);
                if (!ReferenceValues.AllFinite(expected))
                {
                    continue;
                }

                var actual = evaluator.Evaluate(report, t, state);
                var error = ReferenceValues.WorstError(evaluator.Spec, report, actual, expected);
                Assert.True(error <= tolerance,
                    $"{Path.GetFileName(path)} report {evaluator.Spec.Model.Reports[report].Name} at t={t:R}: error {error:G3} > {tolerance:G3}");
                checkedSamples++;
            }
        }

        Assert.True(checkedSamples > 0 || evaluator.Spec.Model.Reports.Count == 0);
    }
}
