namespace MotionSpec.Symbolic;

/// <summary>Shared singleton nodes (held strongly so they stay interned).</summary>
internal static class Nodes
{
    public static readonly Number Zero = Number.Create(Rational.Zero);
    public static readonly Number One = Number.Create(Rational.One);
    public static readonly Number MinusOne = Number.Create(Rational.MinusOne);
    public static readonly Number Two = Number.Create(2);
    public static readonly Number Half = Number.Create(Rational.Half);
    public static readonly PiConstant Pi = PiConstant.Create();
    public static readonly Symbol Time = Symbol.Create("t", SymbolKind.Time, 0);
}
