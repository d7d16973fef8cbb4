namespace MotionSpec.Symbolic;

/// <summary>The constant pi, kept symbolic so that degrees, revolutions and rpm stay exact.</summary>
public sealed class PiConstant : Expr
{
    private PiConstant()
        : base(ExprKind.Pi, 31415, null)
    {
    }

    internal static PiConstant Create() => InternTable.Intern(new PiConstant());

    internal override bool ShallowEquals(Expr other) => other is PiConstant;
}
