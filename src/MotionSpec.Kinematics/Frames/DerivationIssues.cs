using MotionSpec.Language.Binding.Symbols;
using MotionSpec.Symbolic;

using Symbol = MotionSpec.Symbolic.Symbol;

namespace MotionSpec.Kinematics.Frames;

/// <summary>
/// What went wrong while deriving the current report: the first derivative that was not available and the first
/// spin frame whose orientation was needed. The report builder turns these into located diagnostics, so the
/// deep code never throws.
/// </summary>
internal sealed class DerivationIssues
{
    public Symbol? MissingDerivativeOf { get; private set; }

    public FrameSymbol? UnknownOrientationOf { get; private set; }

    public bool Any => MissingDerivativeOf is not null || UnknownOrientationOf is not null;

    public void NeedDerivativeOf(Symbol symbol) => MissingDerivativeOf ??= symbol;

    public void NeedOrientationOf(FrameSymbol spinFrame) => UnknownOrientationOf ??= spinFrame;

    public void Clear()
    {
        MissingDerivativeOf = null;
        UnknownOrientationOf = null;
    }
}
