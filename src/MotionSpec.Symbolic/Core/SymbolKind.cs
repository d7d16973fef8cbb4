namespace MotionSpec.Symbolic;

/// <summary>What a symbol stands for.</summary>
public enum SymbolKind
{
    /// <summary>Time t.</summary>
    Time,

    /// <summary>A constant parameter.</summary>
    Param,

    /// <summary>A generalized coordinate (value, rate or acceleration by Order).</summary>
    Coord,

    /// <summary>A named intermediate or temporary.</summary>
    Intermediate,
}
