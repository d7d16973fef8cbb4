using MotionSpec.Compiler;
using MotionSpec.Kinematics;
using MotionSpec.Symbolic;

namespace MotionSpec.CSharp.Tests;

/// <summary>
/// The reference the emitted code must agree with: the kinematic model's own expressions evaluated by the
/// symbolic engine's evaluation tape (no C# printing, no Roslyn), with params at the spec's values.
/// </summary>
internal static class ReferenceValues
{
    private static readonly System.Runtime.CompilerServices.ConditionalWeakTable<CheckedSpec, EvaluationPlan[]> Plans = new();

    public static double[] Evaluate(CheckedSpec spec, int reportIndex, double t, double[,] coords)
    {
        var bound = spec.Model!.Spec;
        var plans = Plans.GetValue(spec, Compile);
        var inputs = new List<double> { t };
        inputs.AddRange(bound.Parameters.Select(p => p.Value));
        for (var i = 0; i < bound.Coords.Count; i++)
        {
            inputs.AddRange([coords[i, 0], coords[i, 1], coords[i, 2]]);
        }

        var outputs = new double[plans[reportIndex].OutputCount];
        plans[reportIndex].Evaluate(inputs.ToArray(), outputs);
        return outputs;
    }

    // One tape per report over t, every param (derived ones at their spec values) and every coord's value,
    // rate and acceleration: the symbolic engine's own numeric path, sharing nothing with the C# printer.
    private static EvaluationPlan[] Compile(CheckedSpec spec)
    {
        var model = spec.Model!;
        var inputs = new List<Symbol> { Symbol.Time };
        inputs.AddRange(model.Spec.Parameters.Select(KinematicModel.SymbolOf));
        foreach (var coord in model.Spec.Coords)
        {
            inputs.AddRange([KinematicModel.SymbolOf(coord, 0), KinematicModel.SymbolOf(coord, 1), KinematicModel.SymbolOf(coord, 2)]);
        }

        return model.Reports.Select(r => EvaluationPlan.Compile(r.Quantities.SelectMany(q => r[q].Components).ToList(), inputs)).ToArray();
    }

    /// <summary>
    /// CLI.md's error measure, worst over the report's vectors: |a - b| / max(|b|, S, 1e-12), S the largest norm
    /// among the reference vectors of the same dimension.
    /// </summary>
    public static double WorstError(CheckedSpec spec, int reportIndex, double[] actual, double[] expected)
    {
        var quantities = spec.Model!.Reports[reportIndex].Quantities;
        var worst = 0.0;
        for (var q = 0; q < quantities.Count; q++)
        {
            var dimension = QuantityInfo.DimensionOf(quantities[q]);
            var scale = Enumerable.Range(0, quantities.Count).Where(o => QuantityInfo.DimensionOf(quantities[o]) == dimension)
                .Max(o => Norm(expected, o));
            var difference = Math.Sqrt(Enumerable.Range(0, 3).Sum(j => Square(actual[(3 * q) + j] - expected[(3 * q) + j])));
            worst = Math.Max(worst, difference / Math.Max(Math.Max(Norm(expected, q), scale), 1e-12));
        }

        return worst;
    }

    public static bool AllFinite(double[] values) => values.All(double.IsFinite);

    private static double Norm(double[] v, int q) => Math.Sqrt(Square(v[3 * q]) + Square(v[(3 * q) + 1]) + Square(v[(3 * q) + 2]));

    private static double Square(double x) => x * x;
}
