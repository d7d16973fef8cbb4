using BenchmarkDotNet.Attributes;

namespace MotionSpec.Benchmarks.CSharp;

/// <summary>
/// The generated evaluator of an N-link arm against the hand-written forward pass, both producing all 24
/// components of PointMotion, and the 2N sine and cosine calls both must make, timed alone, so the ratio can
/// be read with and without them. The generated code gets each angle's pair from one Math.SinCos call, so
/// those N calls are timed alone too. Setup checks that the two agree before anything is timed.
/// </summary>
[MemoryDiagnoser]
[Config(typeof(ChainColumnsConfig))]
public class ChainEvaluatorBenchmarks
{
    private readonly double[] _output = new double[24];
    private HandWrittenChain _hand = null!;
    private HandWrittenChain _handPaired = null!;
    private GeneratedChain _generated = null!;
    private double[] _q = [], _qd = [], _qdd = [];
    private double _s, _sd, _sdd;

    [Params(1, 3, 6, 12, 24)]
    public int Links { get; set; }

    // Emitting and compiling the arm is paid only in the process that times the generated evaluator, and
    // that process refuses to time it unless it agrees with the hand-written one.
    [GlobalSetup(Target = nameof(Generated))]
    public void SetupGenerated()
    {
        SetupInputs();
        _generated = new GeneratedChain(Links);
        ChainAgreement.Require(_generated, _hand, _q, _qd, _qdd, _s, _sd, _sdd);
        ChainAgreement.Require(_generated, _handPaired, _q, _qd, _qdd, _s, _sd, _sdd);
        _generated.Set(_q, _qd, _qdd, _s, _sd, _sdd);
    }

    [GlobalSetup(Targets = [nameof(HandWritten), nameof(HandWrittenPairedTrig), nameof(SinCosOnly), nameof(SinCosPairsOnly)])]
    public void SetupInputs()
    {
        var random = new Random(20240611 + Links);
        _q = Enumerable.Range(0, Links).Select(_ => (random.NextDouble() * 6) - 3).ToArray();
        _qd = Enumerable.Range(0, Links).Select(_ => (random.NextDouble() * 4) - 2).ToArray();
        _qdd = Enumerable.Range(0, Links).Select(_ => (random.NextDouble() * 4) - 2).ToArray();
        (_s, _sd, _sdd) = (random.NextDouble(), random.NextDouble() - 0.5, random.NextDouble() - 0.5);
        _hand = new HandWrittenChain(Links);
        _handPaired = new HandWrittenChain(Links, pairedTrig: true);
    }

    [Benchmark(Description = "generated")]
    public double Generated()
    {
        _generated.Run(_output);
        return _output[8];
    }

    [Benchmark(Baseline = true, Description = "hand-written")]
    public double HandWritten()
    {
        _hand.Evaluate(_q, _qd, _qdd, _s, _sd, _sdd, ChainSpec.LinkLength, _output);
        return _output[8];
    }

    [Benchmark(Description = "hand-written, SinCos")]
    public double HandWrittenPairedTrig()
    {
        _handPaired.Evaluate(_q, _qd, _qdd, _s, _sd, _sdd, ChainSpec.LinkLength, _output);
        return _output[8];
    }

    [Benchmark(Description = "sin+cos only")]
    public double SinCosOnly()
    {
        var sum = 0.0;
        var q = _q;
        for (var i = 0; i < q.Length; i++)
        {
            sum += Math.Sin(q[i]) + Math.Cos(q[i]);
        }

        return sum;
    }

    [Benchmark(Description = "SinCos pairs only")]
    public double SinCosPairsOnly()
    {
        var sum = 0.0;
        var q = _q;
        for (var i = 0; i < q.Length; i++)
        {
            var (sin, cos) = Math.SinCos(q[i]);
            sum += sin + cos;
        }

        return sum;
    }
}
