using MotionSpec.Language.Binding.Symbols;
using MotionSpec.Symbolic;

namespace MotionSpec.Kinematics.Frames;

/// <summary>
/// A vector kept as a sum of parts, each in the basis where it is simplest (a point's offset in its frame, an
/// origin in its parent's), so rotations are applied only when a result is finally needed in another basis.
/// Parts are ordered by frame index, which keeps every later step deterministic.
/// </summary>
internal sealed class FrameVector
{
    private readonly SortedDictionary<int, (FrameSymbol Basis, Vector3Expr Value)> _parts = [];

    public static FrameVector Zero => new();

    public IEnumerable<(FrameSymbol Basis, Vector3Expr Value)> Parts => _parts.Values;

    public bool IsZero => _parts.Values.All(p => p.Value.IsZero);

    public static FrameVector In(FrameSymbol basis, Vector3Expr value)
    {
        var v = new FrameVector();
        v.AddPart(basis, value);
        return v;
    }

    public FrameVector Plus(FrameVector other)
    {
        var sum = Copy();
        foreach (var (basis, value) in other.Parts)
        {
            sum.AddPart(basis, value);
        }

        return sum;
    }

    public FrameVector Minus(FrameVector other) => Plus(other.Scaled(Expr.Number(-1)));

    public FrameVector Scaled(Expr k)
    {
        var result = new FrameVector();
        foreach (var (basis, value) in Parts)
        {
            result.AddPart(basis, k * value);
        }

        return result;
    }

    /// <summary>Applies a function to each part, keeping its basis.</summary>
    public FrameVector MapParts(Func<FrameSymbol, Vector3Expr, Vector3Expr> f)
    {
        var result = new FrameVector();
        foreach (var (basis, value) in Parts)
        {
            result.AddPart(basis, f(basis, value));
        }

        return result;
    }

    private FrameVector Copy()
    {
        var copy = new FrameVector();
        foreach (var (basis, value) in Parts)
        {
            copy.AddPart(basis, value);
        }

        return copy;
    }

    private void AddPart(FrameSymbol basis, Vector3Expr value)
    {
        if (value.IsZero)
        {
            return;
        }

        if (_parts.TryGetValue(basis.Index, out var existing))
        {
            var sum = existing.Value + value;
            if (sum.IsZero)
            {
                _parts.Remove(basis.Index);
            }
            else
            {
                _parts[basis.Index] = (basis, sum);
            }
        }
        else
        {
            _parts[basis.Index] = (basis, value);
        }
    }
}
