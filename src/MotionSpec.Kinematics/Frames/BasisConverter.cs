using MotionSpec.Language.Binding.Symbols;

namespace MotionSpec.Kinematics.Frames;

/// <summary>
/// Rewrites vectors from one basis into another, one link at a time along the tree. Crossing a spin link with
/// a non-zero vector is impossible (its orientation is unknown) and is recorded as an issue.
/// </summary>
internal sealed class BasisConverter(FrameOrientation orientation, DerivationIssues issues)
{
    private readonly Dictionary<(Vector3Expr Value, int From, int To), Vector3Expr> _cache = [];

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
        var pending = new Dictionary<int, (FrameSymbol Basis, Vector3Expr Value)>();
        foreach (var (basis, value) in vector.Parts)
        {
            pending[basis.Index] = (basis, value);
        }

        while (true)
        {
            (FrameSymbol Basis, Vector3Expr Value)? farthest = null;
            var farthestDistance = 0;
            foreach (var part in pending.Values.OrderBy(p => p.Basis.Index))
            {
                var distance = FrameTree.Distance(part.Basis, target);
                if (distance > farthestDistance)
                {
                    farthest = part;
                    farthestDistance = distance;
                }
            }

            if (farthest is not { } move)
            {
                break;
            }

            pending.Remove(move.Basis.Index);
            var next = FrameTree.StepTowards(move.Basis, target);
            var moved = Step(move.Value, move.Basis, next);
            pending[next.Index] = pending.TryGetValue(next.Index, out var there) ? (next, there.Value + moved) : (next, moved);
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
