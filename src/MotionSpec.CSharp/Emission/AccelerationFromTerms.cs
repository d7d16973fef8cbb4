using MotionSpec.Kinematics;
using MotionSpec.Symbolic;
using Sym = MotionSpec.Symbolic.Symbol;

namespace MotionSpec.CSharp.Emission;

/// <summary>
/// A point report's acceleration is the sum of its five terms, and the kinematics builds it as that sum. Summed as
/// expressions the terms melt into one long flat sum that shares nothing with them, so the emitted code would
/// compute the acceleration a second time. When the identity holds structurally, the acceleration is written as
/// the sum of the five term locals instead: the same value, five additions per component.
/// </summary>
internal static class AccelerationFromTerms
{
    private static readonly Quantity[] Terms = [.. QuantityInfo.Terms];

    /// <summary>
    /// The locals that stand for the term components (15, term by term, x y z each) and the acceleration's three
    /// components as sums of them; null when the report is not a point report or the identity does not hold as
    /// written (a small form the kinematics simplified on its own), in which case nothing changes.
    /// </summary>
    public static (IReadOnlyList<Sym> TermLocals, IReadOnlyList<Expr> Acceleration)? Split(ReportMotion motion, Func<string, bool> isTaken)
    {
        if (motion.Report.Kind != Language.Binding.ReportKind.Point)
        {
            return null;
        }

        var acceleration = motion[Quantity.Acceleration];
        for (var axis = 0; axis < 3; axis++)
        {
            var sum = Expr.Sum(Terms.Select(t => motion[t][axis]));
            if (!sum.Equals(acceleration[axis]))
            {
                return null;
            }
        }

        var locals = new List<Sym>();
        var next = 1;
        for (var i = 0; i < 3 * Terms.Length; i++)
        {
            string name;
            do
            {
                name = "m" + next.ToString(System.Globalization.CultureInfo.InvariantCulture);
                next++;
            }
            while (isTaken(name));

            locals.Add(Sym.Intermediate(name));
        }

        var components = Enumerable.Range(0, 3)
            .Select(axis => Expr.Sum(Enumerable.Range(0, Terms.Length).Select(t => (Expr)locals[(3 * t) + axis])))
            .ToList();
        return (locals, components);
    }
}
