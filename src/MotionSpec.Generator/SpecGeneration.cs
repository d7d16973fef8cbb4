using System.Collections.Immutable;
using System.Text;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Text;
using MotionSpec.Compiler;
using MotionSpec.CSharp;

namespace MotionSpec.Generator;

/// <summary>
/// The result of one spec: a source file (or none) and its diagnostics, held as plain values so the
/// incremental pipeline can tell when nothing changed.
/// </summary>
internal sealed class SpecGeneration : IEquatable<SpecGeneration>
{
    private SpecGeneration(string? hintName, string? source, ImmutableArray<SpecDiagnostic> diagnostics)
    {
        HintName = hintName;
        Source = source;
        Diagnostics = diagnostics;
    }

    public string? HintName { get; }

    public string? Source { get; }

    public ImmutableArray<SpecDiagnostic> Diagnostics { get; }

    public static SpecGeneration Run(SpecInput input)
    {
        if (input.Text is null)
        {
            return new SpecGeneration(null, null,
                [new SpecDiagnostic("MOT1001", true, input.Path, default, default, "the spec file could not be read")]);
        }

        try
        {
            var spec = SpecCompiler.Check(input.Path, input.Text);
            var diagnostics = ImmutableArray.CreateBuilder<SpecDiagnostic>();
            foreach (var d in spec.Diagnostics)
            {
                diagnostics.Add(SpecDiagnostic.From(input.Path, input.Text, d));
            }

            if (spec.HasErrors)
            {
                return new SpecGeneration(null, null, diagnostics.ToImmutable());
            }

            var options = new CSharpEmitOptions(input.Options.Namespace ?? CSharpEmitOptions.DefaultNamespace,
                input.Options.ClassName, input.Options.UseFloat);
            var result = CSharpEmitter.Emit(spec, options);
            foreach (var d in result.Diagnostics)
            {
                diagnostics.Add(SpecDiagnostic.From(input.Path, input.Text, d));
            }

            var hint = result.Code is null ? null : HintNameFor(result.ClassName, input.Path);
            return new SpecGeneration(hint, result.Code, diagnostics.ToImmutable());
        }
#pragma warning disable CA1031 // A generator that throws takes the whole build down with a stack trace; report it instead.
        catch (Exception exception)
#pragma warning restore CA1031
        {
            return new SpecGeneration(null, null,
                [new SpecDiagnostic("MOT5199", true, input.Path, default, default,
                    "internal error while generating the evaluator (a defect of MotionSpec, please report it): " + exception.Message)]);
        }
    }

    public void AddTo(SourceProductionContext context)
    {
        foreach (var diagnostic in Diagnostics)
        {
            context.ReportDiagnostic(diagnostic.ToRoslyn());
        }

        if (HintName is not null && Source is not null)
        {
            context.AddSource(HintName, SourceText.From(Source, Encoding.UTF8));
        }
    }

    public bool Equals(SpecGeneration? other) =>
        other is not null && HintName == other.HintName && Source == other.Source && Diagnostics.SequenceEqual(other.Diagnostics);

    public override bool Equals(object? obj) => Equals(obj as SpecGeneration);

    public override int GetHashCode() => (Source ?? HintName ?? string.Empty).Length ^ Diagnostics.Length;

    // Two specs may give the same class name (in different namespaces); the path keeps hint names apart.
    private static string HintNameFor(string className, string path)
    {
        unchecked
        {
            var hash = 2166136261u;
            foreach (var c in path.Replace('\\', '/'))
            {
                hash = (hash ^ c) * 16777619u;
            }

            return className.TrimStart('@') + "." + hash.ToString("x8", System.Globalization.CultureInfo.InvariantCulture) + ".g.cs";
        }
    }
}
