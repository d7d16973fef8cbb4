using MotionSpec.Language.Binding.Symbols;

namespace MotionSpec.Kinematics.Frames;

/// <summary>
/// Rewrites vectors from one basis into another, one link at a time along the tree. Crossing a spin link with
/// a non-zero vector is impossible (its orientation is unknown) and is recorded as an issue.
/// </summary>
internal sealed class BasisConverter(FrameOrientation orientation, DerivationIssues issues)
{
    /// <summary>
    /// From this many links on, a vector crosses the path through one composed rotation matrix instead of link by
    /// link. The matrix costs about three single-link rotations per link but is shared by every vector crossing
    /// the same path (a point report sends seven), and it is built from the top down, so a long chain is computed
    /// in one forward sweep. Shorter paths keep the link-by-link forms that read best in derivations.
    /// </summary>
    internal const int ComposedPathLength = 5;

    private readonly Dictionary<(Vector3Expr Value, int From, int To), Vector3Expr> _cache = [];
    private readonly Dictionary<(int Frame, int Ancestor), Matrix3Expr?> _down = [];

    public Vector3Expr Convert(Vector3Expr value, FrameSymbol from, FrameSymbol to)
    {
        if (value.IsZero || ReferenceEquals(from, to))
        {
            return value;
        }

        var key = (value, from.Index, to.Index);
        if (_cache.TryGetValue(key, out var known))
        {
            return known;
        }

        if (FrameTree.Distance(from, to) >= ComposedPathLength && Composed(from, to) is { } matrix)
        {
            var crossed = matrix.Apply(value);
            _cache[key] = crossed;
            return crossed;
        }

        var current = value;
        var at = from;
        while (!ReferenceEquals(at, to))
        {
            var next = FrameTree.StepTowards(at, to);
            current = Step(current, at, next);
            at = next;
        }

        _cache[key] = current;
        return current;
    }

    /// <summary>
    /// Sums every part of a vector in one basis. Parts farthest from the target move first and merge with the
    /// parts they meet, like Horner's rule, so a chain of n links costs n rotations instead of n^2.
    /// </summary>
    public Vector3Expr ToBasis(FrameVector vector, FrameSymbol target)
    {
        // Parts strung along one path away from the target (a chain) are gathered at its far end first, so the
        // sweep runs forward, and cross to the target together.
        if (FarEnd(vector, target) is { } far)
        {
            return Convert(Gather(vector, far), far, target);
        }

        return Gather(vector, target);
    }

    /// <summary>The matrix taking components in <paramref name="from"/> to components in <paramref name="to"/>; null across a spin link.</summary>
    private Matrix3Expr? Composed(FrameSymbol from, FrameSymbol to)
    {
        var ancestor = FrameTree.CommonAncestor(from, to);
        var up = Down(from, ancestor);
        var down = Down(to, ancestor);
        return up is null || down is null ? null : down.Transpose().Multiply(up);
    }

    /// <summary>Components in the ancestor from components in the frame: the product of the link rotations, top first.</summary>
    private Matrix3Expr? Down(FrameSymbol frame, FrameSymbol ancestor)
    {
        if (ReferenceEquals(frame, ancestor))
        {
            return Matrix3Expr.Identity;
        }

        var key = (frame.Index, ancestor.Index);
        if (_down.TryGetValue(key, out var known))
        {
            return known;
        }

        // Iterative from the top, caching every prefix, so deep chains never recurse.
        Matrix3Expr? product = Matrix3Expr.Identity;
        foreach (var link in FrameTree.PathBelow(ancestor, frame))
        {
            var linkKey = (link.Index, ancestor.Index);
            if (_down.TryGetValue(linkKey, out var cached))
            {
                product = cached;
                continue;
            }

            var rotation = product is null ? null : orientation.Rotation(link);
            product = rotation is null ? null : product!.Multiply(rotation);
            _down[linkKey] = product;
        }

        return product;
    }

    /// <summary>
    /// The part basis farthest from the target when every part lies on the path from the target to it and that
    /// path is long enough to cross by a composed matrix; otherwise null.
    /// </summary>
    private static FrameSymbol? FarEnd(FrameVector vector, FrameSymbol target)
    {
        FrameSymbol? far = null;
        var farthest = 0;
        foreach (var (basis, _) in vector.Parts)
        {
            var distance = FrameTree.Distance(basis, target);
            if (distance > farthest)
            {
                far = basis;
                farthest = distance;
            }
        }

        if (far is null || farthest < ComposedPathLength)
        {
            return null;
        }

        foreach (var (basis, _) in vector.Parts)
        {
            if (FrameTree.Distance(target, basis) + FrameTree.Distance(basis, far) != farthest)
            {
                return null;
            }
        }

        return far;
    }

    private Vector3Expr Gather(FrameVector vector, FrameSymbol target)
    {
        // Each part's distance to the target is found once and falls by one per step, so a deep chain costs
        // a scan of the pending parts per step rather than a walk of the tree per part per step.
        var pending = new Dictionary<int, (FrameSymbol Basis, Vector3Expr Value, int Distance)>();
        foreach (var (basis, value) in vector.Parts)
        {
            pending[basis.Index] = (basis, value, FrameTree.Distance(basis, target));
        }

        while (true)
        {
            (FrameSymbol Basis, Vector3Expr Value, int Distance)? farthest = null;
            foreach (var part in pending.Values)
            {
                // The farthest part moves first; among equals the earliest frame, for a deterministic order.
                if (part.Distance > 0 && (farthest is not { } best || part.Distance > best.Distance
                    || (part.Distance == best.Distance && part.Basis.Index < best.Basis.Index)))
                {
                    farthest = part;
                }
            }

            if (farthest is not { } move)
            {
                break;
            }

            pending.Remove(move.Basis.Index);
            var next = FrameTree.StepTowards(move.Basis, target);
            var moved = Step(move.Value, move.Basis, next);
            pending[next.Index] = pending.TryGetValue(next.Index, out var there)
                ? (next, there.Value + moved, there.Distance)
                : (next, moved, move.Distance - 1);
        }

        return pending.TryGetValue(target.Index, out var result) ? result.Value : Vector3Expr.Zero;
    }

    private Vector3Expr Step(Vector3Expr value, FrameSymbol from, FrameSymbol to)
    {
        if (value.IsZero)
        {
            return value;
        }

        // Moving up uses the child's rotation; moving down its transpose.
        var child = ReferenceEquals(from.Parent, to) ? from : to;
        var rotation = orientation.Rotation(child);
        if (rotation is null)
        {
            issues.NeedOrientationOf(child);
            return Vector3Expr.Zero;
        }

        return ReferenceEquals(child, from) ? rotation.Apply(value) : rotation.ApplyTranspose(value);
    }
}
