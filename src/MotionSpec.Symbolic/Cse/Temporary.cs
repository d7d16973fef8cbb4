namespace MotionSpec.Symbolic;

/// <summary>A named temporary: Name stands for Value in later temporaries and outputs.</summary>
/// <param name="Name">The temporary's symbol (an intermediate such as k1).</param>
/// <param name="Value">What it computes, in terms of inputs and earlier temporaries.</param>
public sealed record Temporary(Symbol Name, Expr Value);
