using System.Reflection;
using MotionSpec.Compiler;
using MotionSpec.CSharp.Analysis;
using MotionSpec.Kinematics;

namespace MotionSpec.CSharp.Tests;

/// <summary>
/// A spec emitted, checked, compiled in memory and loaded, with its report methods called by reflection.
/// State fields are found by declaration order (value, rate, acceleration of each coord), not by name, so the
/// naming rules are tested separately from the arithmetic.
/// </summary>
internal sealed class LoadedEvaluator
{
    private readonly Type _state;
    private readonly object _parameters;
    private readonly FieldInfo[] _stateFields;
    private readonly MethodInfo[] _methods;
    private readonly bool _float;

    private LoadedEvaluator(CheckedSpec spec, CSharpEmitResult emitted, EmittedCodeReport report, Assembly assembly, bool useFloat)
    {
        Spec = spec;
        Emitted = emitted;
        Report = report;
        Assembly = assembly;
        _float = useFloat;
        var type = assembly.GetType(emitted.Namespace.Replace("@", "") + "." + emitted.ClassName.TrimStart('@'))!;
        Class = type;
        _state = type.GetNestedType("State")!;
        _stateFields = _state.GetFields().OrderBy(f => f.MetadataToken).ToArray();
        _parameters = type.GetNestedType("Parameters")!.GetProperty("Default")!.GetValue(null)!;
        _methods = emitted.Methods.Select(m => type.GetMethod(m.Method.TrimStart('@'))!).ToArray();
    }

    public CheckedSpec Spec { get; }

    public CSharpEmitResult Emitted { get; }

    public EmittedCodeReport Report { get; }

    public Assembly Assembly { get; }

    public Type Class { get; }

    public string Code => Emitted.Code!;

    public static LoadedEvaluator From(string path, string text, CSharpEmitOptions? options = null)
    {
        var spec = SpecCompiler.Check(path, text);
        Assert.False(spec.HasErrors, string.Join("\n", spec.Diagnostics.Select(d => d.Code + " " + d.Message)));
        options ??= new CSharpEmitOptions();
        var emitted = CSharpEmitter.Emit(spec, options);
        Assert.True(emitted.Succeeded, string.Join("\n", emitted.Diagnostics.Select(d => d.Code + " " + d.Message)));
        var report = EmittedCodeCheck.Check(emitted.Code!, emitAssembly: true);
        Assert.True(report.Passed, string.Join("\n", report.Findings) + "\n" + emitted.Code);
        return new LoadedEvaluator(spec, emitted, report, Assembly.Load(report.CopyAssembly()!), options.UseFloat);
    }

    /// <summary>The report's vectors in JSON order, three components each. coords[i, order] is coord i's value, rate, acceleration.</summary>
    public double[] Evaluate(int reportIndex, double t, double[,] coords)
    {
        var state = Activator.CreateInstance(_state)!;
        for (var i = 0; i < coords.GetLength(0); i++)
        {
            for (var order = 0; order < 3; order++)
            {
                _stateFields[(3 * i) + order].SetValue(state, _float ? (object)(float)coords[i, order] : coords[i, order]);
            }
        }

        var motion = _methods[reportIndex].Invoke(null, [_float ? (object)(float)t : t, state, _parameters])!;
        var quantities = Spec.Model!.Reports[reportIndex].Quantities;
        var result = new double[3 * quantities.Count];
        for (var q = 0; q < quantities.Count; q++)
        {
            var key = QuantityInfo.Key(quantities[q]);
            var vector = motion.GetType().GetProperty(char.ToUpperInvariant(key[0]) + key[1..])!.GetValue(motion)!;
            var j = 0;
            foreach (var axis in new[] { "X", "Y", "Z" })
            {
                result[(3 * q) + j++] = Convert.ToDouble(vector.GetType().GetProperty(axis)!.GetValue(vector)!, System.Globalization.CultureInfo.InvariantCulture);
            }
        }

        return result;
    }
}
