namespace MotionSpec.Symbolic;

/// <summary>A power with an exact rational exponent (x^2, x^-1, x^(1/2) for the square root).</summary>
public sealed class Power : Expr
{
    private Power(Expr @base, Rational exponent)
        : base(ExprKind.Power, exponent.GetHashCode(), [@base])
    {
        Exponent = exponent;
    }

    /// <summary>The base.</summary>
    public Expr Base => Children[0];

    /// <summary>The exponent (never 0 or 1).</summary>
    public Rational Exponent { get; }

    internal static Power CreateRaw(Expr @base, Rational exponent) => InternTable.Intern(new Power(@base, exponent));

    internal override bool ShallowEquals(Expr other) =>
        other is Power p && p.Exponent == Exponent && ReferenceEquals(p.Base, Base);
}
