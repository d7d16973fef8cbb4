namespace MotionSpec.Symbolic;

/// <summary>An exact rational constant such as 3 or -3/5.</summary>
public sealed class Number : Expr
{
    private Number(Rational value)
        : base(ExprKind.Number, value.GetHashCode(), null)
    {
        Value = value;
    }

    /// <summary>The exact value.</summary>
    public Rational Value { get; }

    internal static Number Create(Rational value) => InternTable.Intern(new Number(value));

    internal override bool ShallowEquals(Expr other) => other is Number n && n.Value == Value;
}
