namespace MotionSpec.Symbolic;

/// <summary>Straight-line code: temporaries in dependency order, then the outputs in terms of them.</summary>
public sealed class CseProgram
{
    internal CseProgram(IReadOnlyList<Temporary> temporaries, IReadOnlyList<Expr> outputs)
    {
        Temporaries = temporaries;
        Outputs = outputs;
    }

    /// <summary>Temporaries in dependency order; each Value uses only inputs and earlier temporaries.</summary>
    public IReadOnlyList<Temporary> Temporaries { get; }

    /// <summary>The outputs, in terms of inputs and temporaries.</summary>
    public IReadOnlyList<Expr> Outputs { get; }
}
