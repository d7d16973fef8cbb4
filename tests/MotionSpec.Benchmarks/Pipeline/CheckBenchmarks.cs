using System.Text;
using BenchmarkDotNet.Attributes;
using MotionSpec.Benchmarks.Evaluation;
using MotionSpec.Compiler;

namespace MotionSpec.Benchmarks.Pipeline;

/// <summary>
/// check's targets: the largest demo spec well under 50 ms and a generated spec of 200 frames and 2000 points
/// under 1 s after warm-up. Both go through the one pipeline entry, kinematics included.
/// </summary>
[MemoryDiagnoser]
public class CheckBenchmarks
{
    private byte[] _demo = [];
    private byte[] _wide = [];

    [GlobalSetup]
    public void Setup()
    {
        _demo = File.ReadAllBytes(SweepBenchmarks.LargestDemoSpec());
        _wide = Encoding.UTF8.GetBytes(WideSpec(200, 10));
    }

    /// <summary>A tree of <paramref name="frames"/> frames (each a child of one of the first ten) with points in each, and a report per tenth frame.</summary>
    public static string WideSpec(int frames, int pointsPerFrame)
    {
        var text = new StringBuilder("param r = 0.5 m\ncoord q : angle\nframe f0\n");
        for (var i = 1; i < frames; i++)
        {
            var axis = "xyz"[i % 3];
            text.Append(FormattableString.Invariant($"frame f{i} in f{(i - 1) / 10} {{\n    rotate about {axis} by q + {i} * 0.01\n    origin at [r, 0, 0]\n}}\n"));
        }

        for (var i = 0; i < frames; i++)
        {
            for (var j = 0; j < pointsPerFrame; j++)
            {
                text.Append(FormattableString.Invariant($"point p{i}_{j} in f{i} at [{j} * 0.1 m, r, 0]\n"));
            }
        }

        for (var i = 0; i < frames; i += 10)
        {
            text.Append(FormattableString.Invariant($"report p{i}_1 in f0\n"));
        }

        return text.ToString();
    }

    [Benchmark]
    public bool CheckLargestDemo() => SpecCompiler.Check("demo.motion", _demo).HasErrors;

    [Benchmark]
    public bool Check200Frames2000Points() => SpecCompiler.Check("wide.motion", _wide).HasErrors;
}
