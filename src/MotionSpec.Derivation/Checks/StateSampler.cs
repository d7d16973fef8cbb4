using MotionSpec.Kinematics;
using MotionSpec.Symbolic;

namespace MotionSpec.Derivation.Checks;

/// <summary>
/// Random states for numeric checks: params at their spec values (derived ones recomputed), every coord,
/// rate and acceleration and the time drawn from a fixed-seed generator, so that the derivation text is the
/// same on every run.
/// </summary>
internal sealed class StateSampler
{
    private readonly KinematicModel _model;
    private readonly Random _random;

    public StateSampler(KinematicModel model, int seed)
    {
        _model = model;
#pragma warning disable CA5394 // Reproducible test states, not security: a seeded generator is what is wanted.
        _random = new Random(seed);
    }

    public Func<Symbol, double> Next()
    {
        var values = new Dictionary<Symbol, double>();
        foreach (var definition in _model.Parameters)
        {
            var value = Evaluator.Evaluate(definition.Definition, s => values.TryGetValue(s, out var v) ? v : double.NaN);
            values[definition.Symbol] = value.Value;
        }

        foreach (var coord in _model.Spec.Coords)
        {
            for (var order = 0; order <= 2; order++)
            {
                values[KinematicModel.SymbolOf(coord, order)] = Draw();
            }
        }

        values[Symbol.Time] = Draw();
#pragma warning restore CA5394
        return s => values.TryGetValue(s, out var v) ? v : double.NaN;
    }

    private double Draw() => (2 * _random.NextDouble()) - 1 + (0.25 * Math.Sign(_random.NextDouble() - 0.5));
}
