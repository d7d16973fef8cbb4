namespace MotionSpec.Symbolic;

/// <summary>A named quantity: time, a parameter, a coordinate (or its rate or acceleration), or an intermediate.</summary>
public sealed class Symbol : Expr
{
    private Symbol(string name, SymbolKind kind, int order)
        : base(ExprKind.Symbol, HashMix.Combine(HashMix.Combine(HashMix.OfString(name), (int)kind), order), null)
    {
        Name = name;
        Kind = kind;
        Order = order;
    }

    /// <summary>The base name without marks: "psi", "L", "t", "k1".</summary>
    public string Name { get; }

    /// <summary>What the symbol stands for.</summary>
    public SymbolKind Kind { get; }

    /// <summary>For coords: 0 the value, 1 the rate (psi'), 2 the acceleration (psi''); otherwise 0.</summary>
    public int Order { get; }

    /// <summary>Time t.</summary>
    public static Symbol Time => Nodes.Time;

    /// <summary>A parameter (constant in time).</summary>
    public static Symbol Param(string name) => Create(CheckName(name), SymbolKind.Param, 0);

    /// <summary>A coordinate (order 0), its rate (1) or its acceleration (2).</summary>
    /// <exception cref="ArgumentOutOfRangeException">order is not 0, 1 or 2.</exception>
    public static Symbol Coord(string name, int order = 0)
    {
        if (order is < 0 or > 2)
        {
            throw new ArgumentOutOfRangeException(nameof(order), order, "A coordinate mark order is 0, 1 or 2.");
        }

        return Create(CheckName(name), SymbolKind.Coord, order);
    }

    /// <summary>A named intermediate (kinematics intermediates, CSE temporaries).</summary>
    public static Symbol Intermediate(string name) => Create(CheckName(name), SymbolKind.Intermediate, 0);

    /// <summary>For a coord, the same coord with another mark order.</summary>
    /// <exception cref="InvalidOperationException">This is not a coord.</exception>
    public Symbol WithOrder(int order) => Kind == SymbolKind.Coord
        ? Coord(Name, order)
        : throw new InvalidOperationException("Only a coordinate has derivative orders.");

    internal static Symbol Create(string name, SymbolKind kind, int order) => InternTable.Intern(new Symbol(name, kind, order));

    internal override bool ShallowEquals(Expr other) =>
        other is Symbol s && s.Kind == Kind && s.Order == Order && string.Equals(s.Name, Name, StringComparison.Ordinal);

    private static string CheckName(string name)
    {
        if (string.IsNullOrEmpty(name))
        {
            throw new ArgumentException("A symbol needs a name.", nameof(name));
        }

        return name;
    }
}
