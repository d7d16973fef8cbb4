using System.Text;
using BenchmarkDotNet.Attributes;
using MotionSpec.Compiler;
using MotionSpec.Symbolic;

namespace MotionSpec.Benchmarks.Pipeline;

/// <summary>
/// Derivation time and shared node count for chains of 1 to 64 links (target: both growing linearly). The
/// node count is printed at setup and in the NodeCount column.
/// </summary>
[MemoryDiagnoser]
public class ChainDerivationBenchmarks
{
    private string _spec = string.Empty;

    [Params(1, 2, 4, 8, 16, 32, 64)]
    public int Links { get; set; }

    [GlobalSetup]
    public void Setup()
    {
        _spec = Chain(Links);
        Console.WriteLine(FormattableString.Invariant($"// links={Links} nodes={NodeCount()}"));
    }

    /// <summary>A chain of links turning about alternating axes, each offset along its parent's x, with a tip point.</summary>
    public static string Chain(int links)
    {
        var text = new StringBuilder();
        for (var i = 1; i <= links; i++)
        {
            text.Append(FormattableString.Invariant($"coord q{i} : angle\n"));
        }

        text.Append("frame f0\n");
        for (var i = 1; i <= links; i++)
        {
            text.Append(FormattableString.Invariant($"frame f{i} in f{i - 1} {{\n    rotate about {"xyz"[i % 3]} by q{i}\n    origin at [0.3 m, 0, 0]\n}}\n"));
        }

        text.Append(FormattableString.Invariant($"point tip in f{links} at [0.1 m, 0, 0]\nreport tip in f0\n"));
        return text.ToString();
    }

    [Benchmark]
    public int Derive() => SpecCompiler.Check("chain.motion", _spec).Model!.Reports.Count;

    private int NodeCount()
    {
        var report = SpecCompiler.Check("chain.motion", _spec).Model!.Reports.Single();
        return ExprMetrics.NodeCount(report.Quantities.SelectMany(q => report[q].Components));
    }
}
