namespace MotionSpec.CSharp.Analysis;

/// <summary>The outcome of checking one generated file: what is wrong (nothing, we hope) and what each method costs.</summary>
public sealed class EmittedCodeReport
{
    private readonly byte[]? _assembly;

    internal EmittedCodeReport(IReadOnlyList<EmittedCodeFinding> findings, IReadOnlyList<MethodStatistics> methods, byte[]? assembly)
    {
        Findings = findings;
        Methods = methods;
        _assembly = assembly;
    }

    /// <summary>Compiler diagnostics and breaches of the evaluator rules, in file order.</summary>
    public IReadOnlyList<EmittedCodeFinding> Findings { get; }

    /// <summary>True when the file compiled cleanly and broke no rule.</summary>
    public bool Passed => Findings.Count == 0;

    /// <summary>Every method with a body, in declaration order.</summary>
    public IReadOnlyList<MethodStatistics> Methods { get; }

    /// <summary>True when the compiled assembly was asked for and produced.</summary>
    public bool HasAssembly => _assembly is not null;

    /// <summary>A copy of the compiled assembly's bytes (for loading in tests and benchmarks), or null.</summary>
    public byte[]? CopyAssembly() => (byte[]?)_assembly?.Clone();
}
