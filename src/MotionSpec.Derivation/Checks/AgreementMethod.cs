namespace MotionSpec.Derivation.Checks;

/// <summary>How two sets of closed forms were found to agree, or that they do not.</summary>
internal enum AgreementMethod
{
    /// <summary>Every difference simplifies to zero.</summary>
    Symbolic,

    /// <summary>All agree at random states (the differences were too large to simplify, or did not simplify to zero).</summary>
    Numeric,

    /// <summary>They disagree at some state.</summary>
    Disagree,

    /// <summary>No comparison was possible (too few states where both are finite, or no independent form).</summary>
    NotChecked,
}
