using BenchmarkDotNet.Attributes;
using MotionSpec.Benchmarks.CSharp;
using MotionSpec.Compiler;
using MotionSpec.Symbolic;

namespace MotionSpec.Benchmarks.Symbolic;

/// <summary>
/// Simplifying every closed form of an arm's tip report (the arm of <see cref="ChainSpec"/>): position,
/// velocity, acceleration and the five terms, three components each, which share most of their structure.
/// Target: a 12-link arm's outputs in well under 100 ms from nothing remembered. "each alone" forgets between
/// outputs, which is what every output paid before shared nodes were remembered across calls.
/// </summary>
[MemoryDiagnoser]
public class ChainSimplifyBenchmarks
{
    private Expr[] _outputs = [];

    [Params(6, 12)]
    public int Links { get; set; }

    [GlobalSetup]
    public void Setup()
    {
        var model = SpecCompiler.Check("arm.motion", ChainSpec.Text(Links)).Model!;
        _outputs = [.. model.Reports.SelectMany(r => r.Quantities.SelectMany(q => r[q].Components))];
        Simplifier.ForgetRemembered();
        var simplified = _outputs.Select(Simplifier.Simplify).ToArray();
        Console.WriteLine(FormattableString.Invariant(
            $"// links={Links}: {_outputs.Length} outputs, {ExprMetrics.NodeCount(_outputs)} shared DAG nodes (largest output {_outputs.Max(o => ExprMetrics.NodeCount(o))}); simplified {ExprMetrics.NodeCount(simplified)}"));
    }

    [Benchmark(Description = "simplify arm outputs, nothing remembered")]
    public int Cold()
    {
        Simplifier.ForgetRemembered();
        return Simplify();
    }

    [Benchmark(Description = "simplify arm outputs, each alone")]
    public int EachAlone()
    {
        int total = 0;
        foreach (var e in _outputs)
        {
            Simplifier.ForgetRemembered();
            total += Simplifier.Simplify(e).GetHashCode();
        }

        return total;
    }

    [Benchmark(Description = "simplify arm outputs again (remembered)")]
    public int Warm() => Simplify();

    private int Simplify()
    {
        int total = 0;
        foreach (var e in _outputs)
        {
            total += Simplifier.Simplify(e).GetHashCode();
        }

        return total;
    }
}
