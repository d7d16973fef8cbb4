using MotionSpec.Kinematics;
using MotionSpec.Symbolic;

namespace MotionSpec.Derivation.Geometry;

/// <summary>Sums, cross products, rotations and time derivatives of symbolic vectors given in one basis.</summary>
internal static class Vector3Algebra
{
    public static Vector3Expr Add(Vector3Expr a, Vector3Expr b) => new(a.X + b.X, a.Y + b.Y, a.Z + b.Z);

    public static Vector3Expr Subtract(Vector3Expr a, Vector3Expr b) => new(a.X - b.X, a.Y - b.Y, a.Z - b.Z);

    public static Vector3Expr Negate(Vector3Expr a) => new(-a.X, -a.Y, -a.Z);

    public static Vector3Expr Scale(Expr k, Vector3Expr a) => new(k * a.X, k * a.Y, k * a.Z);

    public static Vector3Expr Cross(Vector3Expr a, Vector3Expr b) =>
        IsZero(a) || IsZero(b)
            ? Vector3Expr.Zero
            : new((a.Y * b.Z) - (a.Z * b.Y), (a.Z * b.X) - (a.X * b.Z), (a.X * b.Y) - (a.Y * b.X));

    public static bool IsZero(Vector3Expr a) => a.X.IsZero && a.Y.IsZero && a.Z.IsZero;

    /// <summary>
    /// Above this many distinct nodes a form is shown as composed, as the kinematics leaves it: hand-style
    /// simplification of a long chain's forms costs far more than it gives and can multiply them out.
    /// </summary>
    public const int TidyNodeLimit = 60;

    public static Vector3Expr Simplify(Vector3Expr a) => new(Tidy(a.X), Tidy(a.Y), Tidy(a.Z));

    /// <summary>The simplified form of a small expression; a large one unchanged (see <see cref="TidyNodeLimit"/>).</summary>
    public static Expr Tidy(Expr e) => ExprMetrics.NodeCount(e) <= TidyNodeLimit ? Simplifier.Simplify(e) : e;

    /// <summary>M v: parent components of a vector given in the child's basis (columns of M are the child's axes).</summary>
    public static Vector3Expr Apply(Matrix3Expr m, Vector3Expr v) =>
        new(Row(m, 0, v), Row(m, 1, v), Row(m, 2, v));

    /// <summary>M^T v: child components of a vector given in the parent's basis.</summary>
    public static Vector3Expr ApplyTranspose(Matrix3Expr m, Vector3Expr v) =>
        new(Column(m, 0, v), Column(m, 1, v), Column(m, 2, v));

    /// <summary>Componentwise d/dt (the derivative taken in the basis' own frame); null when a third derivative is needed.</summary>
    public static Vector3Expr? TimeDerivative(Vector3Expr v)
    {
        var parts = new Expr[3];
        for (var axis = 0; axis < 3; axis++)
        {
            var d = Differentiation.TimeDerivative(v[axis]);
            if (!d.Succeeded)
            {
                return null;
            }

            parts[axis] = d.Value;
        }

        return new Vector3Expr(parts[0], parts[1], parts[2]);
    }

    /// <summary>
    /// The derivative taken in a frame F of a vector written in basis C, by the transport theorem:
    /// componentwise derivative plus omega_{C/F} x v. Null when a third derivative is needed.
    /// </summary>
    public static Vector3Expr? DerivativeSeenFrom(Vector3Expr v, Vector3Expr omegaOfBasisRelativeToFrame)
    {
        var d = TimeDerivative(v);
        return d is null ? null : Add(d.Value, Cross(omegaOfBasisRelativeToFrame, v));
    }

    private static Expr Row(Matrix3Expr m, int r, Vector3Expr v) => Expr.Sum([m[r, 0] * v.X, m[r, 1] * v.Y, m[r, 2] * v.Z]);

    private static Expr Column(Matrix3Expr m, int c, Vector3Expr v) => Expr.Sum([m[0, c] * v.X, m[1, c] * v.Y, m[2, c] * v.Z]);
}
