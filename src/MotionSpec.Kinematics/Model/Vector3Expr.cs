using MotionSpec.Symbolic;

namespace MotionSpec.Kinematics;

/// <summary>Three symbolic components of a vector in one frame's basis.</summary>
public readonly record struct Vector3Expr(Expr X, Expr Y, Expr Z)
{
    /// <summary>The zero vector.</summary>
    public static Vector3Expr Zero => new(Expr.Zero, Expr.Zero, Expr.Zero);

    /// <summary>Component 0, 1 or 2.</summary>
    public Expr this[int axis] => axis switch
    {
        0 => X,
        1 => Y,
        2 => Z,
        _ => throw new ArgumentOutOfRangeException(nameof(axis)),
    };

    /// <summary>X, Y and Z in order.</summary>
    public IEnumerable<Expr> Components => [X, Y, Z];

    /// <summary>True when every component is structurally zero.</summary>
    public bool IsZero => X.IsZero && Y.IsZero && Z.IsZero;

    /// <summary>Componentwise sum.</summary>
    public static Vector3Expr operator +(Vector3Expr a, Vector3Expr b) => new(a.X + b.X, a.Y + b.Y, a.Z + b.Z);

    /// <summary>Componentwise difference.</summary>
    public static Vector3Expr operator -(Vector3Expr a, Vector3Expr b) => new(a.X - b.X, a.Y - b.Y, a.Z - b.Z);

    /// <summary>Negation.</summary>
    public static Vector3Expr operator -(Vector3Expr a) => new(-a.X, -a.Y, -a.Z);

    /// <summary>Scaling by a scalar.</summary>
    public static Vector3Expr operator *(Expr k, Vector3Expr a) => k.IsOne ? a : new(k * a.X, k * a.Y, k * a.Z);

    /// <summary>The vector product, both factors in the same basis.</summary>
    public static Vector3Expr Cross(Vector3Expr a, Vector3Expr b) =>
        a.IsZero || b.IsZero
            ? Zero
            : new((a.Y * b.Z) - (a.Z * b.Y), (a.Z * b.X) - (a.X * b.Z), (a.X * b.Y) - (a.Y * b.X));

    /// <summary>The scalar product, both factors in the same basis.</summary>
    public static Expr Dot(Vector3Expr a, Vector3Expr b) => (a.X * b.X) + (a.Y * b.Y) + (a.Z * b.Z);

    /// <summary>Applies a function to each component.</summary>
    public Vector3Expr Map(Func<Expr, Expr> f) => new(f(X), f(Y), f(Z));

    /// <inheritdoc/>
    public override string ToString() => $"[{X}, {Y}, {Z}]";
}
