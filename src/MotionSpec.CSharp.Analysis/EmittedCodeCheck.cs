using System.Globalization;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.CSharp;

namespace MotionSpec.CSharp.Analysis;

/// <summary>
/// Compiles a generated file in memory with the rules a careful consumer would use (nullable on, every
/// warning an error, documentation checked) and walks it to confirm that it is an evaluator: no heap
/// allocation, no call outside System.Math and System.MathF, no loop, jump or recursion.
/// </summary>
public static class EmittedCodeCheck
{
    private static readonly CSharpParseOptions ParseOptions =
        new(LanguageVersion.Latest, DocumentationMode.Diagnose);

    private static readonly CSharpCompilationOptions CompilationOptions =
        new CSharpCompilationOptions(OutputKind.DynamicallyLinkedLibrary)
            .WithNullableContextOptions(NullableContextOptions.Enable)
            .WithGeneralDiagnosticOption(ReportDiagnostic.Error)
            .WithWarningLevel(9999)
            .WithOptimizationLevel(OptimizationLevel.Release)
            .WithDeterministic(true);

    /// <summary>Checks <paramref name="code"/>; with <paramref name="emitAssembly"/> also keeps the compiled bytes.</summary>
    public static EmittedCodeReport Check(string code, bool emitAssembly = false)
    {
        ArgumentNullException.ThrowIfNull(code);
        var tree = CSharpSyntaxTree.ParseText(code, ParseOptions, path: "Generated.cs");
        var compilation = CSharpCompilation.Create(
            "MotionSpec.Generated.Check", [tree], FrameworkReferences.All, CompilationOptions);

        var findings = new List<EmittedCodeFinding>();
        foreach (var diagnostic in compilation.GetDiagnostics())
        {
            if (diagnostic.Severity is DiagnosticSeverity.Hidden)
            {
                continue;
            }

            var position = diagnostic.Location.GetLineSpan().StartLinePosition;
            findings.Add(new EmittedCodeFinding(
                CSharpDiagnosticCodes.CompilerRejected,
                position.Line + 1,
                position.Character + 1,
                "the C# compiler reports " + diagnostic.Id + ": " + diagnostic.GetMessage(CultureInfo.InvariantCulture)));
        }

        var walker = new EvaluatorRulesWalker(compilation.GetSemanticModel(tree));
        walker.Visit(tree.GetRoot());
        findings.AddRange(walker.Findings);
        findings.Sort((a, b) => a.Line != b.Line ? a.Line.CompareTo(b.Line) : a.Column.CompareTo(b.Column));

        byte[]? assembly = null;
        if (emitAssembly && findings.Count == 0)
        {
            using var stream = new MemoryStream();
            var result = compilation.Emit(stream);
            if (result.Success)
            {
                assembly = stream.ToArray();
            }
            else
            {
                findings.AddRange(result.Diagnostics.Where(d => d.Severity == DiagnosticSeverity.Error).Select(d =>
                    new EmittedCodeFinding(CSharpDiagnosticCodes.CompilerRejected,
                        d.Location.GetLineSpan().StartLinePosition.Line + 1,
                        d.Location.GetLineSpan().StartLinePosition.Character + 1,
                        "the C# compiler could not emit: " + d.Id + ": " + d.GetMessage(CultureInfo.InvariantCulture))));
            }
        }

        return new EmittedCodeReport(findings, walker.Methods, assembly);
    }
}
