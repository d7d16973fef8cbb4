using MotionSpec.Compiler;
using MotionSpec.Kinematics;
using MotionSpec.Symbolic;

namespace MotionSpec.Kinematics.Tests;

/// <summary>Checks spec text through the real pipeline and reads reports back for assertions.</summary>
internal static class SpecFixture
{
    public static KinematicModel Model(string text)
    {
        var result = SpecCompiler.Check("test.motion", text);
        Assert.False(result.HasErrors, string.Join(Environment.NewLine, result.Diagnostics.Select(d => $"{d.Code} {d.Message}")));
        return result.Model!;
    }

    public static ReportMotion Report(KinematicModel model, string name) => model.Reports.Single(r => r.Name == name);

    public static Expr Coord(string name, int order = 0) => Symbol.Coord(name, order);

    public static Expr Param(string name) => Symbol.Param(name);

    /// <summary>Values for every symbol of a spec at one random state (params at their spec values).</summary>
    public static Func<Symbol, double> RandomState(KinematicModel model, Random random)
    {
        var values = new Dictionary<Symbol, double> { [Symbol.Time] = random.NextDouble() * 4 - 2 };
        foreach (var coord in model.Spec.Coords)
        {
            for (var order = 0; order <= 2; order++)
            {
                values[Symbol.Coord(coord.Name, order)] = random.NextDouble() * 2 - 1;
            }
        }

        foreach (var p in model.Spec.Parameters)
        {
            values[Symbol.Param(p.Name)] = p.Value;
        }

        return s => values[s];
    }

    public static double[] Evaluate(Vector3Expr v, Func<Symbol, double> state) =>
        v.Components.Select(c => Evaluator.Evaluate(c, state).Value).ToArray();

    public static void AssertClose(double[] expected, double[] actual, double tolerance = 1e-12)
    {
        var scale = Math.Max(1, expected.Select(Math.Abs).Max());
        for (var i = 0; i < 3; i++)
        {
            Assert.True(Math.Abs(expected[i] - actual[i]) <= tolerance * scale, $"component {i}: expected {expected[i]:R}, got {actual[i]:R}");
        }
    }
}
