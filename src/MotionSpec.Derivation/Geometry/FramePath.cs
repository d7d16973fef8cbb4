using MotionSpec.Language.Binding.Symbols;

namespace MotionSpec.Derivation.Geometry;

/// <summary>One link crossed on the way between two frames: up from a child to its parent, or down from a parent to a child.</summary>
internal readonly record struct PathStep(FrameSymbol From, FrameSymbol To, bool IsUp)
{
    /// <summary>The child frame of the link (whose motion relative to its parent defines it).</summary>
    public FrameSymbol Child => IsUp ? From : To;
}

/// <summary>The links between two frames of one tree: up to their nearest common ancestor, then down.</summary>
internal static class FramePath
{
    public static IReadOnlyList<PathStep> Between(FrameSymbol from, FrameSymbol to)
    {
        var up = new List<PathStep>();
        var down = new List<PathStep>();
        var a = from;
        var b = to;
        while (a.Depth > b.Depth)
        {
            up.Add(new PathStep(a, a.Parent!, IsUp: true));
            a = a.Parent!;
        }

        while (b.Depth > a.Depth)
        {
            down.Add(new PathStep(b.Parent!, b, IsUp: false));
            b = b.Parent!;
        }

        while (!ReferenceEquals(a, b) && a.Parent is not null && b.Parent is not null)
        {
            up.Add(new PathStep(a, a.Parent, IsUp: true));
            down.Add(new PathStep(b.Parent, b, IsUp: false));
            a = a.Parent;
            b = b.Parent;
        }

        down.Reverse();
        up.AddRange(down);
        return up;
    }
}
