using MotionSpec.Kinematics;
using MotionSpec.Language.Binding.Symbols;
using MotionSpec.Symbolic;

namespace MotionSpec.Derivation.Geometry;

/// <summary>
/// The frame tree of a model with the operations the derivation needs on it: rewriting a vector in another
/// basis, and composing angular velocities, angular accelerations and origin positions along a path.
/// A rewrite across a link from a spin frame to its parent is impossible (its orientation is not known);
/// those operations then return null.
/// </summary>
internal sealed class FrameGeometry
{
    private readonly Dictionary<FrameSymbol, FrameMotion> _motions = new(ReferenceEqualityComparer.Instance);

    public FrameGeometry(KinematicModel model)
    {
        foreach (var motion in model.Frames)
        {
            _motions[motion.Frame] = motion;
        }
    }

    public FrameMotion MotionOf(FrameSymbol frame) => _motions[frame];

    /// <summary>The components of <paramref name="v"/> (given in <paramref name="from"/>'s basis) in <paramref name="to"/>'s basis.</summary>
    public Vector3Expr? Rewrite(Vector3Expr v, FrameSymbol from, FrameSymbol to)
    {
        if (Vector3Algebra.IsZero(v) || ReferenceEquals(from, to))
        {
            return v;
        }

        foreach (var step in FramePath.Between(from, to))
        {
            var child = step.Child;
            if (child.IsSpin)
            {
                return null;
            }

            var orientation = MotionOf(child).Orientation;
            if (orientation is null)
            {
                continue;
            }

            v = step.IsUp ? Vector3Algebra.Apply(orientation, v) : Vector3Algebra.ApplyTranspose(orientation, v);
        }

        return Vector3Algebra.Simplify(v);
    }

    /// <summary>
    /// omega and alpha of <paramref name="frame"/> relative to <paramref name="observer"/> in <paramref name="basis"/>,
    /// link by link, with the cross term of each composition.
    /// </summary>
    public RotationChain? Compose(FrameSymbol observer, FrameSymbol frame, FrameSymbol basis)
    {
        var steps = new List<RotationStep>();
        var omega = Vector3Expr.Zero;
        var alpha = Vector3Expr.Zero;
        foreach (var step in FramePath.Between(observer, frame))
        {
            var link = MotionOf(step.Child);
            var linkOmega = Rewrite(link.AngularVelocity, step.Child, basis);
            var linkAlpha = Rewrite(link.AngularAcceleration, step.Child, basis);
            if (linkOmega is null || linkAlpha is null)
            {
                return null;
            }

            if (step.IsUp)
            {
                // Seen from the child, the parent turns the other way; its derivative is the same in both frames.
                linkOmega = Vector3Algebra.Negate(linkOmega.Value);
                linkAlpha = Vector3Algebra.Negate(linkAlpha.Value);
            }

            var cross = Vector3Algebra.Simplify(Vector3Algebra.Cross(omega, linkOmega.Value));
            omega = Vector3Algebra.Simplify(Vector3Algebra.Add(omega, linkOmega.Value));
            alpha = Vector3Algebra.Simplify(Vector3Algebra.Add(Vector3Algebra.Add(alpha, linkAlpha.Value), cross));
            steps.Add(new RotationStep(step, linkOmega.Value, linkAlpha.Value, cross, omega, alpha));
        }

        return new RotationChain(observer, frame, basis, steps, omega, alpha);
    }

    /// <summary>The position of <paramref name="frame"/>'s origin relative to <paramref name="observer"/>'s origin, in <paramref name="basis"/>.</summary>
    public Vector3Expr? OriginPosition(FrameSymbol observer, FrameSymbol frame, FrameSymbol basis)
    {
        var sum = Vector3Expr.Zero;
        foreach (var step in FramePath.Between(observer, frame))
        {
            var child = step.Child;
            if (child.Origin is null)
            {
                continue;
            }

            var origin = MotionOf(child).Origin;
            if (origin is null || child.Parent is null)
            {
                return null;
            }

            var inBasis = Rewrite(origin.Value, child.Parent, basis);
            if (inBasis is null)
            {
                return null;
            }

            sum = step.IsUp ? Vector3Algebra.Subtract(sum, inBasis.Value) : Vector3Algebra.Add(sum, inBasis.Value);
        }

        return Vector3Algebra.Simplify(sum);
    }
}

/// <summary>One composition step: the frame reached, the link's omega and alpha, the cross term, and the running totals.</summary>
internal sealed record RotationStep(PathStep Step, Vector3Expr LinkOmega, Vector3Expr LinkAlpha, Vector3Expr Cross, Vector3Expr Omega, Vector3Expr Alpha);

/// <summary>omega_{frame/observer} and alpha_{frame/observer} in a basis, with the steps that built them.</summary>
internal sealed record RotationChain(FrameSymbol Observer, FrameSymbol Frame, FrameSymbol Basis, IReadOnlyList<RotationStep> Steps, Vector3Expr Omega, Vector3Expr Alpha);
