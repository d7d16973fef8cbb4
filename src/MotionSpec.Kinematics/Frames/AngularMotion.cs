using MotionSpec.Language.Binding.Symbols;

namespace MotionSpec.Kinematics.Frames;

/// <summary>
/// Angular velocity and acceleration of any frame K relative to any observer A, written in K's basis, composed
/// link by link. Along a chain from A down to K: omega_K = R^T omega_parent + omega_link and
/// alpha_K = R^T alpha_parent + alpha_link + (R^T omega_parent) x omega_link, the cross term of composition.
/// </summary>
internal sealed class AngularMotion(FrameOrientation orientation, BasisConverter converter)
{
    private readonly Dictionary<(int Frame, int Observer), FrameComposition> _cache = [];

    public Vector3Expr Velocity(FrameSymbol frame, FrameSymbol observer) => Compose(frame, observer).AngularVelocity;

    public Vector3Expr Acceleration(FrameSymbol frame, FrameSymbol observer) => Compose(frame, observer).AngularAcceleration;

    public FrameComposition Compose(FrameSymbol frame, FrameSymbol observer)
    {
        if (ReferenceEquals(frame, observer))
        {
            return new(Vector3Expr.Zero, Vector3Expr.Zero, Vector3Expr.Zero);
        }

        var key = (frame.Index, observer.Index);
        if (_cache.TryGetValue(key, out var known))
        {
            return known;
        }

        var ancestor = FrameTree.CommonAncestor(frame, observer);
        var result = ReferenceEquals(ancestor, observer) ? ComposeDown(frame, observer) : ComposeAcross(frame, observer, ancestor);
        _cache[key] = result;
        return result;
    }

    /// <summary>Observer is an ancestor: walk down from it one link at a time.</summary>
    private FrameComposition ComposeDown(FrameSymbol frame, FrameSymbol observer)
    {
        // Iterative from the observer down, so that a deep tree never recurses deeply.
        var path = FrameTree.PathBelow(observer, frame);
        var omega = Vector3Expr.Zero;
        var alpha = Vector3Expr.Zero;
        var cross = Vector3Expr.Zero;
        var parent = observer;
        foreach (var link in path)
        {
            var key = (link.Index, observer.Index);
            if (_cache.TryGetValue(key, out var known))
            {
                (omega, alpha, cross) = (known.AngularVelocity, known.AngularAcceleration, known.CrossTerm);
                parent = link;
                continue;
            }

            var parentOmega = converter.Convert(omega, parent, link);
            var parentAlpha = converter.Convert(alpha, parent, link);
            var linkOmega = orientation.LinkAngularVelocity(link);
            var linkAlpha = orientation.LinkAngularAcceleration(link);
            cross = Vector3Expr.Cross(parentOmega, linkOmega);
            omega = parentOmega + linkOmega;
            alpha = parentAlpha + linkAlpha + cross;
            _cache[key] = new(omega, alpha, cross);
            parent = link;
        }

        return new(omega, alpha, cross);
    }

    /// <summary>
    /// Observer on another branch: omega_K/A = omega_K/L - omega_A/L and alpha_K/A = alpha_K/L - alpha_A/L -
    /// omega_A/L x omega_K/A, with L the common ancestor, all in K's basis.
    /// </summary>
    private FrameComposition ComposeAcross(FrameSymbol frame, FrameSymbol observer, FrameSymbol ancestor)
    {
        var down = Compose(frame, ancestor);
        var other = Compose(observer, ancestor);
        var otherOmega = converter.Convert(other.AngularVelocity, observer, frame);
        var otherAlpha = converter.Convert(other.AngularAcceleration, observer, frame);
        var omega = down.AngularVelocity - otherOmega;
        var cross = -Vector3Expr.Cross(otherOmega, omega);
        var alpha = down.AngularAcceleration - otherAlpha + cross;
        return new(omega, alpha, cross);
    }
}
