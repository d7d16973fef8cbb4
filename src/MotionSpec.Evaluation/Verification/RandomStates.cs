using MotionSpec.Language.Binding;

namespace MotionSpec.Evaluation.Verification;

/// <summary>
/// Deterministic random states of realistic size: angles in [-pi, pi] with rates and accelerations of about
/// 1 rad/s and 1 rad/s^2, lengths, speeds and accelerations of about the spec's own lengths, t in [0, 10] s,
/// params at the spec's values.
/// </summary>
internal sealed class RandomStates
{
    private readonly BoundSpec _spec;
    private readonly double[] _params;
    private readonly Random _random;
    private readonly double _length;

    // params: every param's value (derived ones recomputed), as the closed-form path resolved them.
    public RandomStates(BoundSpec spec, double[] @params, int seed)
    {
        _spec = spec;
        _params = @params;
        _random = new Random(seed);
        _length = TypicalLength(spec);
    }

    /// <summary>The median magnitude of the spec's nonzero length params, else 1 m.</summary>
    public static double TypicalLength(BoundSpec spec)
    {
        var lengths = spec.Parameters
            .Where(p => p.Dimension == Dimension.LengthDimension && p.Value != 0 && double.IsFinite(p.Value))
            .Select(p => Math.Abs(p.Value))
            .Order()
            .ToArray();
        return lengths.Length == 0 ? 1 : lengths[lengths.Length / 2];
    }

    public MotionState Next()
    {
        var state = new MotionState(_params.Length, _spec.Coords.Count) { Time = Uniform(0, 10) };
        _params.CopyTo(state.Params, 0);
        foreach (var coord in _spec.Coords)
        {
            var scale = coord.Kind == CoordKind.Angle ? 1 : _length;
            state.Values[coord.Index] = coord.Kind == CoordKind.Angle ? Uniform(-Math.PI, Math.PI) : Uniform(-scale, scale);
            state.Rates[coord.Index] = Uniform(-scale, scale);
            state.Accelerations[coord.Index] = Uniform(-scale, scale);
        }

        return state;
    }

    private double Uniform(double low, double high) => low + ((high - low) * _random.NextDouble());
}
