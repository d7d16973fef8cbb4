using System.Globalization;
using System.Reflection;
using System.Text;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.CSharp;
using MotionSpec.Compiler;
using MotionSpec.CSharp;
using MotionSpec.CSharp.Analysis;

namespace MotionSpec.Benchmarks.CSharp;

/// <summary>
/// The arm's evaluator as motionspec emits it, compiled in memory together with a small harness that keeps a
/// State and Parameters in static fields and copies the 24 components of the result into an array, so the
/// benchmark calls it through a delegate with the same output as the hand-written one.
/// </summary>
public sealed class GeneratedChain
{
    private readonly Action<double[], double[], double[], double, double, double> _set;

    public GeneratedChain(int links)
    {
        Links = links;
        var spec = SpecCompiler.Check($"arm{links}.motion", ChainSpec.Text(links));
        if (spec.HasErrors)
        {
            throw new InvalidOperationException("the arm spec does not check: " + string.Join("; ", spec.Diagnostics.Select(d => d.Message)));
        }

        var emitted = CSharpEmitter.Emit(spec, new CSharpEmitOptions("Bench", "Arm"));
        Code = emitted.Code ?? throw new InvalidOperationException("emission failed");
        var report = EmittedCodeCheck.Check(Code);
        if (!report.Passed)
        {
            throw new InvalidOperationException("the generated arm does not pass the check: " + string.Join("; ", report.Findings));
        }

        Operations = report.Methods.First(m => m.Method == emitted.Methods[0].Method).Operations;

        // The harness calls the evaluator, which the rules forbid inside generated code, so it is compiled
        // beside the checked file rather than through the check.
        var references = ((string)AppContext.GetData("TRUSTED_PLATFORM_ASSEMBLIES")!).Split(Path.PathSeparator)
            .Where(p => Path.GetFileName(p).StartsWith("System.", StringComparison.Ordinal) || Path.GetFileName(p) == "netstandard.dll")
            .Select(p => MetadataReference.CreateFromFile(p));
        var compilation = CSharpCompilation.Create("Bench.Arm" + links.ToString(CultureInfo.InvariantCulture),
            [CSharpSyntaxTree.ParseText(Code), CSharpSyntaxTree.ParseText("namespace Bench;\n" + Harness(links, emitted.Methods[0].Method))],
            references, new CSharpCompilationOptions(OutputKind.DynamicallyLinkedLibrary, optimizationLevel: OptimizationLevel.Release));
        using var stream = new MemoryStream();
        var result = compilation.Emit(stream);
        if (!result.Success)
        {
            throw new InvalidOperationException("the harness does not compile: " + string.Join("; ", result.Diagnostics));
        }

        var assembly = Assembly.Load(stream.ToArray());
        var harness = assembly.GetType("Bench.Harness")!;
        Run = harness.GetMethod("Run")!.CreateDelegate<Action<double[]>>();
        _set = harness.GetMethod("Set")!.CreateDelegate<Action<double[], double[], double[], double, double, double>>();
    }

    public int Links { get; }

    public string Code { get; }

    /// <summary>Arithmetic operators and Math calls of the report method, as the analysis counts them.</summary>
    public int Operations { get; }

    /// <summary>Evaluates at the state last given to <see cref="Set"/> and writes the 24 components.</summary>
    public Action<double[]> Run { get; }

    public void Set(double[] q, double[] qd, double[] qdd, double s, double sd, double sdd) => _set(q, qd, qdd, s, sd, sdd);

    private static string Harness(int links, string method)
    {
        var text = new StringBuilder();
        text.Append("\n/// <summary>Benchmark access to the generated arm.</summary>\npublic static class Harness\n{\n");
        text.Append("    private static Arm.State _state;\n    private static Arm.Parameters _parameters = Arm.Parameters.Default;\n\n");
        text.Append("    /// <summary>Stores a state.</summary>\n    /// <param name=\"q\">Angles.</param>\n    /// <param name=\"qd\">Rates.</param>\n");
        text.Append("    /// <param name=\"qdd\">Accelerations.</param>\n    /// <param name=\"s\">Slider.</param>\n    /// <param name=\"sd\">Slider rate.</param>\n");
        text.Append("    /// <param name=\"sdd\">Slider acceleration.</param>\n");
        text.Append("    public static void Set(double[] q, double[] qd, double[] qdd, double s, double sd, double sdd)\n    {\n");
        for (var i = 0; i < links; i++)
        {
            var n = (i + 1).ToString(CultureInfo.InvariantCulture);
            var k = i.ToString(CultureInfo.InvariantCulture);
            text.Append($"        _state.q{n} = q[{k}]; _state.q{n}_dot = qd[{k}]; _state.q{n}_ddot = qdd[{k}];\n");
        }

        text.Append("        _state.s = s; _state.s_dot = sd; _state.s_ddot = sdd;\n    }\n\n");
        text.Append("    /// <summary>Evaluates and copies the result.</summary>\n    /// <param name=\"o\">24 components.</param>\n");
        text.Append("    [global::System.Runtime.CompilerServices.MethodImpl(global::System.Runtime.CompilerServices.MethodImplOptions.AggressiveOptimization)]\n");
        text.Append($"    public static void Run(double[] o)\n    {{\n        var m = Arm.{method}(0.0, in _state, in _parameters);\n");
        var vectors = new[] { "Position", "Velocity", "Acceleration", "Relative", "Centripetal", "Angular", "Coriolis", "Origin" };
        for (var v = 0; v < vectors.Length; v++)
        {
            foreach (var (axis, j) in new[] { ("X", 0), ("Y", 1), ("Z", 2) })
            {
                text.Append(CultureInfo.InvariantCulture, $"        o[{(3 * v) + j}] = m.{vectors[v]}.{axis};\n");
            }
        }

        text.Append("    }\n}\n");
        return text.ToString();
    }
}
