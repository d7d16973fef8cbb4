using MotionSpec.Compiler;
using MotionSpec.Kinematics;
using MotionSpec.Symbolic;

namespace MotionSpec.CSharp.Tests;

/// <summary>
/// The reference the emitted code must agree with: the kinematic model's own expressions evaluated by the
/// symbolic engine's evaluator (no CSE, no printing, no C#), with params at the spec's values.
/// </summary>
internal static class ReferenceValues
{
    public static double[] Evaluate(CheckedSpec spec, int reportIndex, double t, double[,] coords)
    {
        var bound = spec.Model!.Spec;
        var paramValues = bound.Parameters.ToDictionary(p => p.Name, p => p.Value, StringComparer.Ordinal);
        var coordIndex = bound.Coords.Select((c, i) => (c.Name, i)).ToDictionary(p => p.Name, p => p.i, StringComparer.Ordinal);
        double ValueOf(Symbol s) => s.Kind switch
        {
            SymbolKind.Time => t,
            SymbolKind.Param => paramValues[s.Name],
            SymbolKind.Coord => coords[coordIndex[s.Name], s.Order],
            _ => throw new InvalidOperationException("unexpected symbol " + s.Name),
        };

        var report = spec.Model.Reports[reportIndex];
        return report.Quantities.SelectMany(q => report[q].Components).Select(e => Evaluator.Evaluate(e, ValueOf).Value).ToArray();
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
