namespace MotionSpec.Symbolic;

/// <summary>
/// An immutable, hash-consed symbolic expression: structurally equal expressions are the same object, so
/// equality is a reference comparison and hashing reads a cached field.
/// </summary>
public abstract class Expr : IEquatable<Expr>, IComparable<Expr>
{
    private static readonly Expr[] NoChildren = [];

    private protected Expr(ExprKind kind, int hash, Expr[]? children)
    {
        NodeKind = kind;
        Children = children ?? NoChildren;
        long size = 1;
        bool constant = kind != ExprKind.Symbol;
        int depth = 0;
        foreach (var child in Children)
        {
            size += child.TreeSize;
            if (size < 0 || size > int.MaxValue)
            {
                size = int.MaxValue;
            }

            constant &= child.IsConstant;
            depth = Math.Max(depth, child.Depth);
            hash = HashMix.Combine(hash, child.Hash);
        }

        Hash = HashMix.Combine(hash, (int)kind);
        TreeSize = (int)size;
        IsConstant = constant;
        Depth = Children.Length == 0 ? 0 : depth + 1;
    }

    internal ExprKind NodeKind { get; }

    internal Expr[] Children { get; }

    internal int Hash { get; }

    /// <summary>Node count of the expression printed without sharing, saturating at int.MaxValue.</summary>
    internal int TreeSize { get; }

    internal int Depth { get; }

    /// <summary>
    /// What the simplifier made of this node, valid while <see cref="SimplifiedEpoch"/> matches its epoch. Held
    /// on the node rather than in a side table so that remembering costs the garbage collector nothing extra.
    /// </summary>
    internal Expr? SimplifiedAs { get; set; }

    internal int SimplifiedEpoch { get; set; }

    /// <summary>0.</summary>
    public static Expr Zero => Nodes.Zero;

    /// <summary>1.</summary>
    public static Expr One => Nodes.One;

    /// <summary>The constant pi.</summary>
    public static Expr Pi => Nodes.Pi;

    /// <summary>True for the number 0.</summary>
    public bool IsZero => ReferenceEquals(this, Nodes.Zero);

    /// <summary>True for the number 1.</summary>
    public bool IsOne => ReferenceEquals(this, Nodes.One);

    /// <summary>No symbols inside (numbers, pi, and functions of them).</summary>
    public bool IsConstant { get; }

    /// <summary>An exact number.</summary>
    public static Expr Number(Rational value) => Symbolic.Number.Create(value);

    /// <summary>An exact integer.</summary>
    public static Expr Number(long value) => Symbolic.Number.Create(value);

    /// <summary>Canonical sum.</summary>
    public static Expr operator +(Expr a, Expr b) => SumBuilder.Build([a, b]);

    /// <summary>Canonical difference.</summary>
    public static Expr operator -(Expr a, Expr b) => SumBuilder.Build([a, ProductBuilder.Scale(b, Rational.MinusOne)]);

    /// <summary>Canonical product.</summary>
    public static Expr operator *(Expr a, Expr b) => ProductBuilder.Build([a, b]);

    /// <summary>Canonical quotient a * b^-1.</summary>
    public static Expr operator /(Expr a, Expr b) => ProductBuilder.Build([a, PowerRules.Pow(b, Rational.MinusOne)]);

    /// <summary>Canonical negation -1 * a.</summary>
    public static Expr operator -(Expr a) => ProductBuilder.Scale(a, Rational.MinusOne);

    /// <summary>Named alternative to +.</summary>
    public static Expr Add(Expr left, Expr right) => left + right;

    /// <summary>Named alternative to binary -.</summary>
    public static Expr Subtract(Expr left, Expr right) => left - right;

    /// <summary>Named alternative to *.</summary>
    public static Expr Multiply(Expr left, Expr right) => left * right;

    /// <summary>Named alternative to /.</summary>
    public static Expr Divide(Expr left, Expr right) => left / right;

    /// <summary>Named alternative to unary -.</summary>
    public static Expr Negate(Expr item) => -item;

    /// <summary>Canonical sum of any number of terms (empty gives 0).</summary>
    public static Expr Sum(IEnumerable<Expr> terms) => SumBuilder.Build(terms);

    /// <summary>Canonical product of any number of factors (empty gives 1).</summary>
    public static Expr Product(IEnumerable<Expr> factors) => ProductBuilder.Build(factors);

    /// <summary>Canonical power with an exact rational exponent.</summary>
    public static Expr Pow(Expr @base, Rational exponent) => PowerRules.Pow(@base, exponent);

    /// <summary>sin(x).</summary>
    public static Expr Sin(Expr x) => FunctionRules.Apply(Function.Sin, x);

    /// <summary>cos(x).</summary>
    public static Expr Cos(Expr x) => FunctionRules.Apply(Function.Cos, x);

    /// <summary>tan(x).</summary>
    public static Expr Tan(Expr x) => FunctionRules.Apply(Function.Tan, x);

    /// <summary>asin(x).</summary>
    public static Expr Asin(Expr x) => FunctionRules.Apply(Function.Asin, x);

    /// <summary>acos(x).</summary>
    public static Expr Acos(Expr x) => FunctionRules.Apply(Function.Acos, x);

    /// <summary>atan(x).</summary>
    public static Expr Atan(Expr x) => FunctionRules.Apply(Function.Atan, x);

    /// <summary>sqrt(x), held as x^(1/2).</summary>
    public static Expr Sqrt(Expr x) => PowerRules.Pow(x, Rational.Half);

    /// <summary>exp(x).</summary>
    public static Expr Exp(Expr x) => FunctionRules.Apply(Function.Exp, x);

    /// <summary>ln(x).</summary>
    public static Expr Ln(Expr x) => FunctionRules.Apply(Function.Ln, x);

    /// <summary>atan2(y, x).</summary>
    public static Expr Atan2(Expr y, Expr x) => FunctionRules.Atan2(y, x);

    /// <summary>A function applied to its arguments (one, or two for atan2).</summary>
    /// <exception cref="ArgumentException">Wrong number of arguments.</exception>
    public static Expr Call(Function f, params Expr[] args)
    {
        if (args is null)
        {
            throw new ArgumentNullException(nameof(args));
        }

        int expected = f == Function.Atan2 ? 2 : 1;
        if (args.Length != expected)
        {
            throw new ArgumentException($"{f} takes {expected} argument(s), got {args.Length}.", nameof(args));
        }

        return f switch
        {
            Function.Atan2 => FunctionRules.Atan2(args[0], args[1]),
            Function.Sqrt => PowerRules.Pow(args[0], Rational.Half),
            _ => FunctionRules.Apply(f, args[0]),
        };
    }

    /// <summary>True only for a Number node; gives its value.</summary>
    public bool TryGetRational(out Rational value)
    {
        if (this is Number n)
        {
            value = n.Value;
            return true;
        }

        value = Rational.Zero;
        return false;
    }

    /// <summary>Reference equality, which is structural equality because nodes are hash-consed.</summary>
    public bool Equals(Expr? other) => ReferenceEquals(this, other);

    /// <inheritdoc />
    public sealed override bool Equals(object? obj) => ReferenceEquals(this, obj);

    /// <summary>The cached deterministic structural hash.</summary>
    public sealed override int GetHashCode() => Hash;

    /// <summary>The canonical total order (deterministic, never by hash or identity).</summary>
    public int CompareTo(Expr? other) => other is null ? 1 : ExprOrder.Compare(this, other);

    /// <summary>Equality operator (structural).</summary>
    public static bool operator ==(Expr? a, Expr? b) => ReferenceEquals(a, b);

    /// <summary>Inequality operator (structural).</summary>
    public static bool operator !=(Expr? a, Expr? b) => !ReferenceEquals(a, b);

    /// <summary>Canonical order: less than.</summary>
    public static bool operator <(Expr a, Expr b) => ExprOrder.Compare(a, b) < 0;

    /// <summary>Canonical order: greater than.</summary>
    public static bool operator >(Expr a, Expr b) => ExprOrder.Compare(a, b) > 0;

    /// <summary>Canonical order: less or equal.</summary>
    public static bool operator <=(Expr a, Expr b) => ExprOrder.Compare(a, b) <= 0;

    /// <summary>Canonical order: greater or equal.</summary>
    public static bool operator >=(Expr a, Expr b) => ExprOrder.Compare(a, b) >= 0;

    /// <summary>Implicit conversion from an integer.</summary>
    public static implicit operator Expr(int value) => Symbolic.Number.Create(value);

    /// <summary>Implicit conversion from a rational.</summary>
    public static implicit operator Expr(Rational value) => Symbolic.Number.Create(value);

    /// <summary>Named alternative to the implicit conversion.</summary>
    public static Expr FromRational(Rational value) => Symbolic.Number.Create(value);

    /// <summary>The expression in spec syntax (TextPrinter).</summary>
    public override string ToString() => TextPrinter.Print(this);

    /// <summary>Same kind, same scalar data, and reference-equal children (children are already interned).</summary>
    internal abstract bool ShallowEquals(Expr other);

    internal bool SameChildren(Expr other)
    {
        var a = Children;
        var b = other.Children;
        if (a.Length != b.Length)
        {
            return false;
        }

        for (int i = 0; i < a.Length; i++)
        {
            if (!ReferenceEquals(a[i], b[i]))
            {
                return false;
            }
        }

        return true;
    }
}
