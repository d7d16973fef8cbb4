namespace MotionSpec.Fuzz;

/// <summary>How far one input went: the last stage that ran, and the codes of the diagnostics all stages gave.</summary>
/// <param name="Codes">Diagnostic codes from the checker and, when they ran, eval and the emitter, in order.</param>
/// <param name="LastStage">The last stage run on the input.</param>
public sealed record FuzzOutcome(IReadOnlyList<string> Codes, FuzzStage LastStage);

/// <summary>The stages of the fuzz target, in the order they run.</summary>
public enum FuzzStage
{
    /// <summary>Only the checker ran: the spec had errors, or its model was too large for the back end.</summary>
    Check,

    /// <summary>Eval and emit ran as well, and the derivations when the model is small enough for them.</summary>
    BackEnd,
}
