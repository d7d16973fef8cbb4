using MotionSpec.Kinematics;
using MotionSpec.Symbolic;

namespace MotionSpec.Derivation.Tests.Support;

/// <summary>Random states for the tests: params at their spec values, coords, marks and time drawn from a seeded generator.</summary>
internal static class RandomStates
{
    public static IEnumerable<Func<Symbol, double>> Draw(KinematicModel model, int count, int seed)
    {
        var random = new Random(seed);
        for (var i = 0; i < count; i++)
        {
            var values = new Dictionary<Symbol, double>();
            foreach (var p in model.Parameters)
            {
                values[p.Symbol] = Evaluator.Evaluate(p.Definition, s => values[s]).Value;
            }

            foreach (var c in model.Spec.Coords)
            {
                for (var order = 0; order <= 2; order++)
                {
                    values[KinematicModel.SymbolOf(c, order)] = (4 * random.NextDouble()) - 2;
                }
            }

            values[Symbol.Time] = (4 * random.NextDouble()) - 2;
            yield return s => values[s];
        }
    }
}
