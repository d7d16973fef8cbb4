using MotionSpec.Language.Binding.Symbols;
using MotionSpec.Kinematics.Lowering;
using MotionSpec.Symbolic;

namespace MotionSpec.Kinematics.Frames;

/// <summary>
/// Each frame's orientation relative to its parent and the angular velocity and acceleration of that link, in
/// the frame's own basis. Successive turns about one axis are merged first by adding their angles, so a frame
/// written as several small turns costs one rotation matrix.
/// </summary>
internal sealed class FrameOrientation(Func<Language.Binding.Expressions.BoundExpr, Expr> lowerScalar, Func<Language.Binding.Expressions.BoundExpr, Vector3Expr> lowerOwnBracket, TimeDerivatives derivatives)
{
    private readonly Dictionary<int, Matrix3Expr> _rotations = [];
    private readonly Dictionary<int, Vector3Expr> _omega = [];
    private readonly Dictionary<int, Vector3Expr> _alpha = [];
    private readonly Dictionary<int, IReadOnlyList<(Vector3Expr Axis, Expr Angle)>> _turns = [];

    /// <summary>True when the frame turns relative to its parent by construction (a rotate or a spin).</summary>
    public static bool Turns(FrameSymbol frame) => frame.IsSpin || frame.Rotations.Count > 0;

    /// <summary>The rotation matrix relative to the parent; identity for no rotation; null for a spin frame.</summary>
    public Matrix3Expr? Rotation(FrameSymbol frame)
    {
        if (frame.IsSpin)
        {
            return null;
        }

        if (!_rotations.TryGetValue(frame.Index, out var matrix))
        {
            matrix = Matrix3Expr.Identity;
            foreach (var (axis, angle) in Turns(frame.Index, frame))
            {
                matrix = matrix.Multiply(Elementary(axis, angle));
            }

            _rotations[frame.Index] = matrix;
        }

        return matrix;
    }

    /// <summary>The merged turns of a frame: unit axis (in the frame as turned so far) and angle.</summary>
    public IReadOnlyList<(Vector3Expr Axis, Expr Angle)> MergedTurns(FrameSymbol frame) => Turns(frame.Index, frame);

    /// <summary>omega of the link frame/parent in the frame's basis.</summary>
    public Vector3Expr LinkAngularVelocity(FrameSymbol frame)
    {
        if (_omega.TryGetValue(frame.Index, out var omega))
        {
            return omega;
        }

        if (frame.Spin is { } spin)
        {
            omega = lowerOwnBracket(spin);
        }
        else
        {
            // omega = sum over turns i of (R_{i+1} ... R_n)^T a_i q_i', accumulated from the last turn back.
            omega = Vector3Expr.Zero;
            var after = Matrix3Expr.Identity;
            var turns = MergedTurns(frame);
            for (var i = turns.Count - 1; i >= 0; i--)
            {
                var (axis, angle) = turns[i];
                omega += after.ApplyTranspose(derivatives.Of(angle) * axis);
                after = Elementary(axis, angle).Multiply(after);
            }
        }

        _omega[frame.Index] = omega;
        return omega;
    }

    /// <summary>alpha of the link: d/dt of omega's components (the same in the frame and its parent).</summary>
    public Vector3Expr LinkAngularAcceleration(FrameSymbol frame)
    {
        if (!_alpha.TryGetValue(frame.Index, out var alpha))
        {
            alpha = derivatives.Of(LinkAngularVelocity(frame));
            _alpha[frame.Index] = alpha;
        }

        return alpha;
    }

    private IReadOnlyList<(Vector3Expr Axis, Expr Angle)> Turns(int index, FrameSymbol frame)
    {
        if (_turns.TryGetValue(index, out var known))
        {
            return known;
        }

        var turns = new List<(Vector3Expr Axis, Expr Angle)>();
        foreach (var rotation in frame.Rotations)
        {
            var axis = AxisOf(rotation);
            var angle = lowerScalar(rotation.Angle);
            if (turns.Count > 0 && turns[^1].Axis.Equals(axis))
            {
                turns[^1] = (axis, turns[^1].Angle + angle);
            }
            else
            {
                turns.Add((axis, angle));
            }
        }

        _turns[index] = turns;
        return turns;
    }

    private static Vector3Expr AxisOf(BoundRotation rotation)
    {
        switch (rotation.Axis)
        {
            case Axis.X: return new(Expr.One, Expr.Zero, Expr.Zero);
            case Axis.Y: return new(Expr.Zero, Expr.One, Expr.Zero);
            case Axis.Z: return new(Expr.Zero, Expr.Zero, Expr.One);
        }

        var d = rotation.Direction!.Select(ExpressionLowering.Constant).ToArray();
        var length = Expr.Sqrt(Expr.Sum(d.Select(c => c * c)));
        return new(d[0] / length, d[1] / length, d[2] / length);
    }

    /// <summary>Rodrigues' form R = cos q I + sin q [a]x + (1 - cos q) a a^T, with the coordinate axes written out.</summary>
    private static Matrix3Expr Elementary(Vector3Expr a, Expr angle)
    {
        var c = Expr.Cos(angle);
        var s = Expr.Sin(angle);
        var zero = Expr.Zero;
        var one = Expr.One;
        if (a.Equals(new Vector3Expr(one, zero, zero)))
        {
            return new([one, zero, zero, zero, c, -s, zero, s, c]);
        }

        if (a.Equals(new Vector3Expr(zero, one, zero)))
        {
            return new([c, zero, s, zero, one, zero, -s, zero, c]);
        }

        if (a.Equals(new Vector3Expr(zero, zero, one)))
        {
            return new([c, -s, zero, s, c, zero, zero, zero, one]);
        }

        var v = one - c;
        return new(
        [
            c + (v * a.X * a.X), (v * a.X * a.Y) - (s * a.Z), (v * a.X * a.Z) + (s * a.Y),
            (v * a.Y * a.X) + (s * a.Z), c + (v * a.Y * a.Y), (v * a.Y * a.Z) - (s * a.X),
            (v * a.Z * a.X) - (s * a.Y), (v * a.Z * a.Y) + (s * a.X), c + (v * a.Z * a.Z),
        ]);
    }
}
