using System.Collections.ObjectModel;

namespace MotionSpec.Symbolic;

/// <summary>An elementary function applied to its argument(s): sin(x), atan2(y, x).</summary>
public sealed class Call : Expr
{
    private ReadOnlyCollection<Expr>? _arguments;

    private Call(Function function, Expr[] arguments)
        : base(ExprKind.Call, 9000 + (int)function, arguments)
    {
        Function = function;
    }

    /// <summary>The function.</summary>
    public Function Function { get; }

    /// <summary>The arguments (two for atan2: y then x).</summary>
    public IReadOnlyList<Expr> Arguments => _arguments ??= new ReadOnlyCollection<Expr>(Children);

    internal static Call CreateRaw(Function function, Expr[] arguments) => InternTable.Intern(new Call(function, arguments));

    internal override bool ShallowEquals(Expr other) =>
        other is Call c && c.Function == Function && SameChildren(other);
}
