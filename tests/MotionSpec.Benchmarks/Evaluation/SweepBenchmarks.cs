using BenchmarkDotNet.Attributes;
using MotionSpec.Compiler;
using MotionSpec.Evaluation.ClosedForm;
using MotionSpec.Evaluation.Inputs;
using MotionSpec.Evaluation.Output;
using MotionSpec.Evaluation.Sweeps;
using MotionSpec.Language.Diagnostics;

namespace MotionSpec.Benchmarks.Evaluation;

/// <summary>
/// eval's target: 10,000 samples of the largest demo spec (every report) in well under 0.5 s. Compile is
/// measured apart from the sweep, which reuses one compiled plan per report and one set of buffers.
/// </summary>
[MemoryDiagnoser]
public class SweepBenchmarks
{
    private ModelEvaluator _evaluator = null!;
    private EvaluationRun _run = null!;
    private CheckedSpec _spec = null!;

    /// <summary>The demo spec with the most frames, points and reports (ties: the longer file).</summary>
    public static string LargestDemoSpec()
    {
        var directory = new DirectoryInfo(AppContext.BaseDirectory);
        while (directory is not null && !File.Exists(Path.Combine(directory.FullName, "MotionSpec.sln")))
        {
            directory = directory.Parent;
        }

        var demo = Path.Combine(directory?.FullName ?? ".", "specs-demo");
        return Directory.GetFiles(demo, "*.motion")
            .Select(p => (Path: p, Spec: SpecCompiler.Check(p, File.ReadAllBytes(p))))
            .Where(p => !p.Spec.HasErrors)
            .OrderByDescending(p => p.Spec.Bound!.Frames.Count + p.Spec.Bound.Points.Count + p.Spec.Bound.Reports.Count)
            .ThenByDescending(p => new FileInfo(p.Path).Length)
            .First().Path;
    }

    [GlobalSetup]
    public void Setup()
    {
        var path = LargestDemoSpec();
        _spec = SpecCompiler.Check(path, File.ReadAllBytes(path));
        _evaluator = ModelEvaluator.Compile(_spec.Model!);
        var inputs = EvaluationInputs.Defaults(_spec.Bound!);
        _run = _evaluator.Prepare(inputs, new TimeSamples(0, 1e-3, 10_000), _spec.Bound!.Reports, new DiagnosticBag())!;
    }

    /// <summary>Compiling every report's plan (done once per eval).</summary>
    [Benchmark]
    public ModelEvaluator Compile() => ModelEvaluator.Compile(_spec.Model!);

    /// <summary>10,000 samples of every report, as eval's finiteness pass does.</summary>
    [Benchmark]
    public bool Sweep10k() => _run.CheckFinite(new DiagnosticBag());

    /// <summary>The whole of eval after checking: the finiteness pass, then CSV for 10,000 samples.</summary>
    [Benchmark]
    public void SweepAndWriteCsv10k()
    {
        _run.CheckFinite(new DiagnosticBag());
        CsvWriter.Write(_run, TextWriter.Null);
    }
}
