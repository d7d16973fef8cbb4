using MotionSpec.Kinematics;
using MotionSpec.Symbolic;

namespace MotionSpec.Evaluation.ClosedForm;

/// <summary>
/// The order of a compiled plan's inputs: t, then every param in file order (derived ones too), then each
/// coord's value, rate and acceleration in file order.
/// </summary>
internal sealed class InputLayout
{
    public InputLayout(KinematicModel model)
    {
        var symbols = new List<Symbol> { Symbol.Time };
        ParamSlots = new int[model.Spec.Parameters.Count];
        foreach (var definition in model.Parameters)
        {
            ParamSlots[definition.Param.Index] = symbols.Count;
            symbols.Add(definition.Symbol);
        }

        CoordSlots = new int[model.Spec.Coords.Count];
        foreach (var coord in model.Spec.Coords)
        {
            CoordSlots[coord.Index] = symbols.Count;
            symbols.Add(KinematicModel.SymbolOf(coord, 0));
            symbols.Add(KinematicModel.SymbolOf(coord, 1));
            symbols.Add(KinematicModel.SymbolOf(coord, 2));
        }

        Symbols = symbols;
    }

    /// <summary>The plan's inputs in order.</summary>
    public IReadOnlyList<Symbol> Symbols { get; }

    /// <summary>Slot of each param, by the param's index.</summary>
    public int[] ParamSlots { get; }

    /// <summary>Slot of each coord's value (its rate and acceleration follow), by the coord's index.</summary>
    public int[] CoordSlots { get; }

    /// <summary>Writes a state into a plan's input buffer.</summary>
    public void Fill(MotionState state, Span<double> inputs)
    {
        inputs[0] = state.Time;
        for (var i = 0; i < ParamSlots.Length; i++)
        {
            inputs[ParamSlots[i]] = state.Params[i];
        }

        for (var i = 0; i < CoordSlots.Length; i++)
        {
            var slot = CoordSlots[i];
            inputs[slot] = state.Values[i];
            inputs[slot + 1] = state.Rates[i];
            inputs[slot + 2] = state.Accelerations[i];
        }
    }
}
