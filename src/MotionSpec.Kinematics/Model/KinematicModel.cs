using MotionSpec.Language.Binding;
using MotionSpec.Language.Binding.Symbols;
using MotionSpec.Symbolic;

using Symbol = MotionSpec.Symbolic.Symbol;

namespace MotionSpec.Kinematics;

/// <summary>
/// The closed forms of a whole spec: each frame's motion relative to its parent, each report's vectors, and the
/// params as symbols with their SI definitions. Evaluation, C# emission and derivations read only this.
/// </summary>
public sealed class KinematicModel
{
    private readonly Func<FrameSymbol, FrameSymbol, FrameComposition> _compose;

    internal KinematicModel(
        BoundSpec spec,
        IReadOnlyList<ParameterDefinition> parameters,
        IReadOnlyList<FrameMotion> frames,
        IReadOnlyList<ReportMotion> reports,
        Func<FrameSymbol, FrameSymbol, FrameComposition> compose)
    {
        Spec = spec;
        Parameters = parameters;
        Frames = frames;
        Reports = reports;
        _compose = compose;
    }

    /// <summary>The bound spec this model was derived from.</summary>
    public BoundSpec Spec { get; }

    /// <summary>Every param in file order.</summary>
    public IReadOnlyList<ParameterDefinition> Parameters { get; }

    /// <summary>Every frame in file order.</summary>
    public IReadOnlyList<FrameMotion> Frames { get; }

    /// <summary>Every report in file order.</summary>
    public IReadOnlyList<ReportMotion> Reports { get; }

    /// <summary>The symbol standing for a param (derived params too).</summary>
    public static Symbol SymbolOf(ParamSymbol param) => Symbol.Param(param.Name);

    /// <summary>The symbol of a coord (order 0), its rate (1) or acceleration (2).</summary>
    public static Symbol SymbolOf(CoordSymbol coord, int order) => Symbol.Coord(coord.Name, order);

    /// <summary>
    /// Angular velocity and acceleration of <paramref name="frame"/> relative to <paramref name="observer"/>, in the
    /// frame's basis, with the cross term of the last composition step. Only meaningful for pairs whose path
    /// crosses no spin link with an unknown orientation (as in every legal report).
    /// </summary>
    public FrameComposition Compose(FrameSymbol frame, FrameSymbol observer) => _compose(frame, observer);
}
