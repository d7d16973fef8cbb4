using BenchmarkDotNet.Attributes;
using MotionSpec.Symbolic;

namespace MotionSpec.Benchmarks.Symbolic;

/// <summary>
/// d/dt along a chain of nested functions, where each level uses the one below twice: the tree doubles per
/// level, the DAG grows by a constant. The derivative's DAG size must grow at most linearly with depth.
/// </summary>
[MemoryDiagnoser]
public class NestedChainBenchmarks
{
    private Expr _chain = null!;

    [Params(64, 512, 4096)]
    public int Depth { get; set; }

    [GlobalSetup]
    public void Setup()
    {
        _chain = SyntheticExpressions.NestedChain(Depth);
        var d = Differentiation.TimeDerivative(_chain).Value;
        int nodes = ExprMetrics.NodeCount(d);
        Console.WriteLine($"// depth {Depth}: expression {ExprMetrics.NodeCount(_chain)} DAG nodes, derivative {nodes} DAG nodes ({(double)nodes / Depth:F2} per level)");
    }

    [Benchmark(Description = "d/dt of nested chain")]
    public int DerivativeNodeCount() => ExprMetrics.NodeCount(Differentiation.TimeDerivative(_chain).Value);
}
