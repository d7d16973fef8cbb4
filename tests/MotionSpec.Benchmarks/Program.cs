using BenchmarkDotNet.Running;

// Run with: dotnet run -c Release --project tests/MotionSpec.Benchmarks -- --filter '*'
BenchmarkSwitcher.FromAssembly(typeof(Program).Assembly).Run(args);

/// <summary>Entry point type for BenchmarkSwitcher.</summary>
internal sealed partial class Program;
