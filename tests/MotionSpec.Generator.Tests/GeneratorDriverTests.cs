using System.Collections.Immutable;
using System.Reflection;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.CSharp;

namespace MotionSpec.Generator.Tests;

/// <summary>The generator run by a plain CSharpGeneratorDriver, as the compiler runs it in a build.</summary>
public class GeneratorDriverTests
{
    private const string Turntable = """
        title "Turntable carrying a sample"
        param R = 0.25 m
        param w = 30 rpm
        frame ground
        frame table in ground {
            rotate about z by w * t
        }
        point sample in table at [R, 0, 0]
        report sample in ground
        report table in ground
        """;

    [Fact]
    public void A_spec_becomes_an_evaluator_that_compiles_with_the_expected_members()
    {
        var (output, diagnostics, generated) = Run(("/specs/turntable.motion", Turntable));

        Assert.Empty(diagnostics);
        Assert.Single(generated);
        Assert.Empty(output.GetDiagnostics().Where(d => d.Severity >= DiagnosticSeverity.Warning));
        var type = output.GetTypeByMetadataName("MotionSpec.Generated.Turntable");
        Assert.NotNull(type);
        Assert.Equal(
            ["FrameMotion", "Parameters", "PointMotion", "SampleInGround", "State", "TableInGround", "Vec3"],
            type!.GetMembers().Where(m => m.DeclaredAccessibility == Accessibility.Public && !m.IsImplicitlyDeclared)
                .Select(m => m.Name).Distinct().Order(StringComparer.Ordinal));
        var parameters = output.GetTypeByMetadataName("MotionSpec.Generated.Turntable+Parameters")!;
        Assert.Equal(["Default", "R", "w"], parameters.GetMembers().Where(m => !m.IsImplicitlyDeclared && m is IFieldSymbol or IPropertySymbol)
            .Select(m => m.Name).Order(StringComparer.Ordinal));
    }

    [Fact]
    public void The_generated_evaluator_gives_the_centripetal_acceleration_of_a_turntable()
    {
        var (output, _, _) = Run(("/specs/turntable.motion", Turntable));
        using var stream = new MemoryStream();
        Assert.True(output.Emit(stream).Success);
        var assembly = Assembly.Load(stream.ToArray());
        var evaluator = assembly.GetType("MotionSpec.Generated.Turntable")!;
        var state = Activator.CreateInstance(evaluator.GetNestedType("State")!)!;
        var parameters = evaluator.GetNestedType("Parameters")!.GetProperty("Default")!.GetValue(null)!;

        var motion = evaluator.GetMethod("SampleInGround")!.Invoke(null, [0.0, state, parameters])!;
        var centripetal = motion.GetType().GetProperty("Centripetal")!.GetValue(motion)!;
        var x = (double)centripetal.GetType().GetProperty("X")!.GetValue(centripetal)!;

        // A point on a disc turning at a constant rate w: acceleration w^2 R towards the centre (common practice).
        var w = 30 * 2 * Math.PI / 60;
        Assert.Equal(-w * w * 0.25, x, 12);
    }

    [Fact]
    public void A_spec_error_is_a_compiler_diagnostic_at_the_spec_line_and_column()
    {
        const string bad = "param R = 0.25 m\nframe ground\nframe table in grund {\n    rotate about z by 0.3\n}\n";

        var (_, diagnostics, generated) = Run(("/specs/broken.motion", bad));

        Assert.Empty(generated);
        var error = Assert.Single(diagnostics, d => d.Severity == DiagnosticSeverity.Error);
        Assert.StartsWith("MOT2", error.Id, StringComparison.Ordinal);
        Assert.Contains("grund", error.GetMessage(), StringComparison.Ordinal);
        var span = error.Location.GetLineSpan();
        Assert.Equal("/specs/broken.motion", span.Path);
        // 'grund' starts on line 3, column 16 (zero-based 2 and 15 in the compiler's convention).
        Assert.Equal((2, 15), (span.StartLinePosition.Line, span.StartLinePosition.Character));
    }

    [Fact]
    public void A_rename_is_a_compiler_warning_at_the_spec_name()
    {
        const string spec = "coord psi : angle\ncoord psi_dot : angle\nframe ground\nframe arm in ground { rotate about z by psi + psi_dot }\n";

        var (output, diagnostics, generated) = Run(("/specs/arm.motion", spec));

        Assert.Single(generated);
        var warning = Assert.Single(diagnostics);
        Assert.Equal(("MOT5101", DiagnosticSeverity.Warning), (warning.Id, warning.Severity));
        Assert.Equal((1, 6), (warning.Location.GetLineSpan().StartLinePosition.Line, warning.Location.GetLineSpan().StartLinePosition.Character));
        Assert.Empty(output.GetDiagnostics().Where(d => d.Severity >= DiagnosticSeverity.Warning));
    }

    private static (Compilation Output, ImmutableArray<Diagnostic> Diagnostics, ImmutableArray<SyntaxTree> Generated) Run(
        params (string Path, string Text)[] specs)
    {
        var references = ((string)AppContext.GetData("TRUSTED_PLATFORM_ASSEMBLIES")!).Split(Path.PathSeparator)
            .Where(p => Path.GetFileName(p).StartsWith("System.", StringComparison.Ordinal) || Path.GetFileName(p) is "netstandard.dll" or "mscorlib.dll")
            .Select(p => MetadataReference.CreateFromFile(p));
        var consumer = CSharpCompilation.Create("Consumer",
            [CSharpSyntaxTree.ParseText("namespace App; internal static class Program { }", new CSharpParseOptions(LanguageVersion.Latest))],
            references,
            new CSharpCompilationOptions(OutputKind.DynamicallyLinkedLibrary).WithNullableContextOptions(NullableContextOptions.Enable));
        GeneratorDriver driver = CSharpGeneratorDriver.Create(
            [new MotionSpecGenerator().AsSourceGenerator()],
            specs.Select(s => (AdditionalText)new InMemoryAdditionalText(s.Path, s.Text)),
            new CSharpParseOptions(LanguageVersion.Latest));
        driver = driver.RunGeneratorsAndUpdateCompilation(consumer, out var output, out var diagnostics);
        var generated = driver.GetRunResult().GeneratedTrees;
        return (output, diagnostics, generated);
    }
}
