using MotionSpec.Symbolic;

namespace MotionSpec.Kinematics;

/// <summary>
/// A 3x3 symbolic rotation matrix whose columns are a frame's unit vectors written in its parent's basis, so
/// that parent components = M * frame components.
/// </summary>
public sealed class Matrix3Expr
{
    private readonly Expr[] _entries;

    /// <summary>Builds a matrix from nine entries in row-major order.</summary>
    public Matrix3Expr(IReadOnlyList<Expr> rowMajor)
    {
        if (rowMajor.Count != 9)
        {
            throw new ArgumentException("A 3x3 matrix needs nine entries.", nameof(rowMajor));
        }

        _entries = rowMajor.ToArray();
    }

    /// <summary>The identity.</summary>
    public static Matrix3Expr Identity { get; } = new([Expr.One, Expr.Zero, Expr.Zero, Expr.Zero, Expr.One, Expr.Zero, Expr.Zero, Expr.Zero, Expr.One]);

    /// <summary>The entry at a row and column (0-based).</summary>
    public Expr this[int row, int column] => _entries[(3 * row) + column];

    /// <summary>True when this is structurally the identity.</summary>
    public bool IsIdentity => ReferenceEquals(this, Identity) || Enumerable.Range(0, 9).All(i => _entries[i].Equals(Identity._entries[i]));

    /// <summary>M * v: components in the parent's basis of a vector given in the frame's basis.</summary>
    public Vector3Expr Apply(Vector3Expr v) => IsIdentity ? v : new(Row(0, v), Row(1, v), Row(2, v));

    /// <summary>M^T * v: components in the frame's basis of a vector given in the parent's basis.</summary>
    public Vector3Expr ApplyTranspose(Vector3Expr v) => IsIdentity ? v : new(Column(0, v), Column(1, v), Column(2, v));

    /// <summary>The matrix product this * other.</summary>
    public Matrix3Expr Multiply(Matrix3Expr other)
    {
        if (other.IsIdentity)
        {
            return this;
        }

        if (IsIdentity)
        {
            return other;
        }

        var entries = new Expr[9];
        for (var r = 0; r < 3; r++)
        {
            for (var c = 0; c < 3; c++)
            {
                entries[(3 * r) + c] = Expr.Sum([this[r, 0] * other[0, c], this[r, 1] * other[1, c], this[r, 2] * other[2, c]]);
            }
        }

        return new Matrix3Expr(entries);
    }

    /// <summary>The transpose (the inverse, for a rotation).</summary>
    public Matrix3Expr Transpose() =>
        IsIdentity ? this : new([this[0, 0], this[1, 0], this[2, 0], this[0, 1], this[1, 1], this[2, 1], this[0, 2], this[1, 2], this[2, 2]]);

    /// <summary>Column c: the frame's unit vector c in the parent's basis.</summary>
    public Vector3Expr ColumnVector(int c) => new(this[0, c], this[1, c], this[2, c]);

    private Expr Row(int r, Vector3Expr v) => Expr.Sum([this[r, 0] * v.X, this[r, 1] * v.Y, this[r, 2] * v.Z]);

    private Expr Column(int c, Vector3Expr v) => Expr.Sum([this[0, c] * v.X, this[1, c] * v.Y, this[2, c] * v.Z]);
}
