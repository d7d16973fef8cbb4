using System.Collections.ObjectModel;

namespace MotionSpec.Symbolic;

/// <summary>A canonical product of two or more factors; a numeric coefficient, if any, is the first factor.</summary>
public sealed class Product : Expr
{
    private ReadOnlyCollection<Expr>? _factors;
    private Expr? _rest;

    private Product(Expr[] factors)
        : base(ExprKind.Product, 7002, factors)
    {
    }

    /// <summary>The factors in canonical order.</summary>
    public IReadOnlyList<Expr> Factors => _factors ??= new ReadOnlyCollection<Expr>(Children);

    /// <summary>The numeric coefficient (1 when there is none).</summary>
    public Rational Coefficient => Children[0] is Symbolic.Number n ? n.Value : Rational.One;

    /// <summary>The product without its numeric coefficient (this product when it has none).</summary>
    internal Expr WithoutCoefficient()
    {
        if (_rest is not null)
        {
            return _rest;
        }

        Expr rest;
        if (Children[0] is not Symbolic.Number)
        {
            rest = this;
        }
        else if (Children.Length == 2)
        {
            rest = Children[1];
        }
        else
        {
            var factors = new Expr[Children.Length - 1];
            Array.Copy(Children, 1, factors, 0, factors.Length);
            rest = CreateRaw(factors);
        }

        _rest = rest;
        return rest;
    }

    internal static Product CreateRaw(Expr[] sortedFactors) => InternTable.Intern(new Product(sortedFactors));

    internal override bool ShallowEquals(Expr other) => other is Product && SameChildren(other);
}
