namespace MotionSpec.Symbolic;

/// <summary>A numeric value and whether it is finite (not NaN or infinite).</summary>
public readonly struct EvaluationResult : IEquatable<EvaluationResult>
{
    /// <summary>Wraps a value.</summary>
    public EvaluationResult(double value)
    {
        Value = value;
    }

    /// <summary>The value (may be NaN or infinite; check IsFinite).</summary>
    public double Value { get; }

    /// <summary>False for NaN and infinities (a division by zero, a root of a negative number, ...).</summary>
    public bool IsFinite => DoubleSemantics.IsFinite(Value);

    /// <inheritdoc />
    public bool Equals(EvaluationResult other) => Value.Equals(other.Value);

    /// <inheritdoc />
    public override bool Equals(object? obj) => obj is EvaluationResult other && Equals(other);

    /// <inheritdoc />
    public override int GetHashCode() => Value.GetHashCode();

    /// <summary>Equality.</summary>
    public static bool operator ==(EvaluationResult left, EvaluationResult right) => left.Equals(right);

    /// <summary>Inequality.</summary>
    public static bool operator !=(EvaluationResult left, EvaluationResult right) => !left.Equals(right);
}
