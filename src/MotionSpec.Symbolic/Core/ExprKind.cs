namespace MotionSpec.Symbolic;

/// <summary>Node kinds in their canonical sort rank (numbers first, then pi, symbols, powers, products, sums, calls).</summary>
internal enum ExprKind
{
    Number = 0,
    Pi = 1,
    Symbol = 2,
    Power = 3,
    Product = 4,
    Sum = 5,
    Call = 6,
}
