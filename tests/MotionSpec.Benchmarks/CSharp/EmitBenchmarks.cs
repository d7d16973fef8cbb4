using BenchmarkDotNet.Attributes;
using MotionSpec.Compiler;
using MotionSpec.CSharp;
using MotionSpec.CSharp.Analysis;

namespace MotionSpec.Benchmarks.CSharp;

/// <summary>How long emitting a 32-link arm takes in process: check + emit, and with the Roslyn check as `emit` runs it.</summary>
[MemoryDiagnoser]
public class EmitBenchmarks
{
    private string _text = string.Empty;

    [GlobalSetup]
    public void Setup()
    {
        _text = ChainSpec.Text(32);

        // The operation counts of the generated arms (Roslyn's count), printed into the run's log.
        foreach (var links in new[] { 1, 3, 6, 12, 16, 24, 32 })
        {
            Console.WriteLine($"// operations of the generated {links}-link arm: {new GeneratedChain(links).Operations}");
        }
    }

    [Benchmark(Description = "check + emit, 32 links")]
    public int CheckAndEmit() => CSharpEmitter.Emit(SpecCompiler.Check("arm32.motion", _text), new CSharpEmitOptions()).Code!.Length;

    [Benchmark(Description = "check + emit + Roslyn check, 32 links")]
    public int CheckEmitAndCompile()
    {
        var code = CSharpEmitter.Emit(SpecCompiler.Check("arm32.motion", _text), new CSharpEmitOptions()).Code!;
        return EmittedCodeCheck.Check(code).Findings.Count;
    }
}
