using System.Globalization;
using System.Text;
using System.Text.Json;
using MotionSpec.Compiler;
using MotionSpec.CSharp;
using MotionSpec.Derivation;
using MotionSpec.Evaluation.ClosedForm;
using MotionSpec.Evaluation.Inputs;
using MotionSpec.Evaluation.Output;
using MotionSpec.Evaluation.Sweeps;
using MotionSpec.Language;
using MotionSpec.Language.Diagnostics;

namespace MotionSpec.Cli.Tests;

/// <summary>
/// Long chains of frames, each inside the previous one, through every command: beyond the tree depth limit a
/// single located MOT2216, never a crash; at the limit an answer.
/// </summary>
public sealed class DeepTreeTests : IDisposable
{
    private const int LongChain = 3000;

    private readonly TempFolder _folder = new();

    public void Dispose() => _folder.Dispose();

    /// <summary>
    /// A root and <paramref name="links"/> frames, each turned about z by q and moved out along x by a, one per
    /// line: frame link i is on line 3 + i. A point at a along the last link's x axis, one report of it.
    /// </summary>
    internal static string Chain(int links)
    {
        var text = new StringBuilder("param a = 0.25 m\ncoord q : angle\nframe link0\n");
        for (var i = 1; i <= links; i++)
        {
            text.Append(CultureInfo.InvariantCulture, $"frame link{i} in link{i - 1} {{ rotate about z by q origin at [a, 0, 0] }}\n");
        }

        text.Append(CultureInfo.InvariantCulture, $"point tip in link{links} at [a, 0, 0]\nreport tip in link0 as tipInBase\n");
        return text.ToString();
    }

    public static TheoryData<string[]> EveryCommand() => new()
    {
        new[] { "check" },
        new[] { "eval" },
        new[] { "eval", "--format", "json", "--t", "0:1:2" },
        new[] { "emit", "-o", "OUT/Chain.cs" },
        new[] { "emit" },
        new[] { "derive" },
        new[] { "derive", "--format", "latex", "-o", "OUT/chain.tex" },
        new[] { "derive", "--format", "text" },
        new[] { "plot", "-o", "OUT/chain.svg" },
        new[] { "verify" },
    };

    [Theory]
    [MemberData(nameof(EveryCommand))]
    public void Chain_of_3000_is_one_tree_depth_error_at_link_501_on_every_command(string[] command)
    {
        var spec = _folder.Write("chain.motion", Chain(LongChain));
        var args = command.Select(a => a.Replace("OUT", _folder.Path, StringComparison.Ordinal)).ToList();
        args.Insert(1, spec);

        var run = CliRun.Of([.. args]);

        Assert.Equal(ExitCodes.SpecErrors, run.ExitCode);
        Assert.Equal(string.Empty, run.Stdout);
        var line = Assert.Single(run.StderrLines);
        Assert.Equal(
            $"{spec}({3 + Limits.FrameTreeDepth + 1},7): error MOT2216: frame 'link501' would be 501 levels below its root; the tree depth limit is 500",
            line);
        Assert.Equal(["chain.motion"], Directory.GetFiles(_folder.Path).Select(Path.GetFileName));
    }

    [Fact]
    public void Chain_of_3000_in_json_diagnostics_is_one_entry_at_the_same_place()
    {
        var spec = _folder.Write("chain.motion", Chain(LongChain));

        var run = CliRun.Of("check", spec, "--diagnostics", "json");

        using var json = JsonDocument.Parse(run.Stderr);
        var entry = Assert.Single(json.RootElement.EnumerateArray().ToList());
        Assert.Equal("MOT2216", entry.GetProperty("code").GetString());
        Assert.Equal(3 + Limits.FrameTreeDepth + 1, entry.GetProperty("line").GetInt32());
        Assert.Equal(7, entry.GetProperty("column").GetInt32());
        Assert.Equal(14, entry.GetProperty("endColumn").GetInt32());
    }
}

/// <summary>One check of a chain exactly at the depth limit, shared by the tests of the stages after it.</summary>
public sealed class ChainAtTheLimit
{
    public ChainAtTheLimit()
    {
        Text = DeepTreeTests.Chain(Limits.FrameTreeDepth);
        Spec = SpecCompiler.Check("chain.motion", Text);
    }

    public string Text { get; }

    public CheckedSpec Spec { get; }
}

/// <summary>
/// A chain exactly 500 links deep (the limit) gets an answer from check, eval, emit and derive. The stages after
/// check run here on the test's own thread, with an ordinary stack: the command line gives them a much larger
/// one, and the source generator runs the emitter on the compiler's thread, so neither may recurse per link.
/// </summary>
public sealed class ChainAtTheLimitTests(ChainAtTheLimit chain) : IClassFixture<ChainAtTheLimit>
{
    private const double A = 0.25;
    private const int N = Limits.FrameTreeDepth;

    [Fact]
    public void Checks_clean()
    {
        Assert.Empty(chain.Spec.Diagnostics);
        Assert.NotNull(chain.Spec.Model);
    }

    [Fact]
    public void Eval_agrees_with_the_planar_chain_sums_at_q_0()
    {
        // Planar chain of equal links, each turned by q from the one before (common practice, geometric sums):
        // tip = a * sum_{k=0..n} (cos kq, sin kq). At q = 0 with rate w and no acceleration that gives
        // position ((n+1) a, 0), velocity (0, a w n(n+1)/2) and acceleration (-a w^2 n(n+1)(2n+1)/6, 0).
        // The steps of `eval --format json --set q'=0.01`, on the spec checked once for this class.
        const double w = 0.01;
        Assert.True(SettingParser.TryParse(chain.Spec.Bound!, ["q'=0.01"], out var inputs, out var errors), string.Join("\n", errors));
        Assert.True(TimeSampleParser.TryParse("0", out var samples, out _));
        var found = new DiagnosticBag();
        var run = ModelEvaluator.Compile(chain.Spec.Model!).Prepare(inputs, samples, chain.Spec.Bound!.Reports, found);
        Assert.NotNull(run);
        Assert.True(run!.CheckFinite(found));
        Assert.Empty(found.Items);
        using var stdout = new StringWriter();
        JsonReportWriter.Write(run, chain.Spec.DisplayName, stdout);
        using var json = JsonDocument.Parse(stdout.ToString());
        var sample = json.RootElement.GetProperty("reports")[0].GetProperty("samples")[0];
        AssertVector([(N + 1) * A, 0, 0], sample.GetProperty("position"));
        AssertVector([0, A * w * N * (N + 1) / 2.0, 0], sample.GetProperty("velocity"));
        AssertVector([-A * w * w * N * (N + 1) * ((2 * N) + 1) / 6.0, 0, 0], sample.GetProperty("acceleration"));
    }

    [Fact]
    public void Emits_a_method_for_the_report()
    {
        var emitted = CSharpEmitter.Emit(chain.Spec, new CSharpEmitOptions());

        Assert.True(emitted.Succeeded, string.Join("\n", emitted.Diagnostics));
        Assert.Contains("public static PointMotion TipInBase(", emitted.Code, StringComparison.Ordinal);
    }

    [Fact]
    public void Derives_the_text_form()
    {
        var text = DerivationWriter.Write(chain.Spec.Model!, chain.Spec.DisplayName, DerivationFormat.Text);

        Assert.Contains("\ntipInBase.acceleration = [", text, StringComparison.Ordinal);
        Assert.Contains("\ntipInBase.coriolis = [", text, StringComparison.Ordinal);
    }

    private static void AssertVector(double[] expected, JsonElement actual)
    {
        var scale = expected.Max(Math.Abs);
        for (var i = 0; i < 3; i++)
        {
            Assert.True(
                Math.Abs(actual[i].GetDouble() - expected[i]) <= 1e-9 * scale,
                $"component {i}: expected {expected[i].ToString("R", CultureInfo.InvariantCulture)}, got {actual[i].GetRawText()}");
        }
    }
}
