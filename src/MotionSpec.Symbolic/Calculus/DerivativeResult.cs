namespace MotionSpec.Symbolic;

/// <summary>A time derivative, or the symbol whose derivative was needed but is not available.</summary>
public sealed class DerivativeResult
{
    private readonly Expr? _value;

    private DerivativeResult(Expr? value, Symbol? missing)
    {
        _value = value;
        MissingDerivativeOf = missing;
    }

    /// <summary>True when the derivative was formed.</summary>
    public bool Succeeded => _value is not null;

    /// <summary>The derivative.</summary>
    /// <exception cref="InvalidOperationException">The derivative could not be formed (see MissingDerivativeOf).</exception>
    public Expr Value => _value ?? throw new InvalidOperationException(
        "No time derivative: the derivative of " + TextPrinter.Print(MissingDerivativeOf!) + " is not available.");

    /// <summary>The symbol (a coord's acceleration q'', or an intermediate) whose derivative was needed.</summary>
    public Symbol? MissingDerivativeOf { get; }

    internal static DerivativeResult Success(Expr value) => new(value, null);

    internal static DerivativeResult Missing(Symbol symbol) => new(null, symbol);
}
