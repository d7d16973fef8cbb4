using MotionSpec.Language.Binding;

namespace MotionSpec.Evaluation.Inputs;

/// <summary>
/// What the command line sets for one spec, in SI: values of independent params (null keeps the spec's own)
/// and each coord's value, rate and acceleration (0 unless set), both indexed like the spec's lists.
/// </summary>
public sealed class EvaluationInputs
{
    internal EvaluationInputs(double?[] paramOverrides, CoordSetting[] coords)
    {
        ParamOverrides = paramOverrides;
        Coords = coords;
    }

    /// <summary>Per param (by index): the value set, or null to keep the spec's value or recompute a derived one.</summary>
    public IReadOnlyList<double?> ParamOverrides { get; }

    /// <summary>Per coord (by index): its value, rate and acceleration at the start of the sweep.</summary>
    public IReadOnlyList<CoordSetting> Coords { get; }

    /// <summary>Nothing set: the spec's params and every coord at rest at 0.</summary>
    public static EvaluationInputs Defaults(BoundSpec spec)
    {
        ArgumentNullException.ThrowIfNull(spec);
        return new EvaluationInputs(new double?[spec.Parameters.Count], new CoordSetting[spec.Coords.Count]);
    }
}
