namespace MotionSpec.Derivation;

/// <summary>The caution that closes every derivation, in every format.</summary>
public static class SafetyCaution
{
    /// <summary>The caution as one paragraph of plain text.</summary>
    public const string Text =
        "Caution: these formulas follow from the spec and from nothing else, so they are only as good as the spec "
        + "(its frames, dimensions, signs and assumed motions). Before any result is used to size a part or to judge "
        + "a load on people, payloads or structures, check it against the codes and standards that apply to the "
        + "machine and have it reviewed by a qualified engineer.";
}
