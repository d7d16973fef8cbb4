using MotionSpec.Language.Binding.Symbols;

namespace MotionSpec.Kinematics.Frames;

/// <summary>
/// Paths, common ancestors and basis relatedness in the frame forest. Two bases are related when the tree path
/// between them crosses no link from a spin frame to its parent: such a link hides the orientation.
/// </summary>
internal sealed class FrameTree
{
    private readonly int[] _component;

    public FrameTree(IReadOnlyList<FrameSymbol> frames)
    {
        _component = new int[frames.Count];
        foreach (var frame in frames)
        {
            // Parents come before children in file order, so one pass labels every component.
            _component[frame.Index] = frame.Parent is null || frame.IsSpin ? frame.Index : _component[frame.Parent.Index];
        }
    }

    public static bool SameTree(FrameSymbol a, FrameSymbol b) => ReferenceEquals(a.Root, b.Root);

    public bool AreRelated(FrameSymbol a, FrameSymbol b) => SameTree(a, b) && _component[a.Index] == _component[b.Index];

    public static FrameSymbol CommonAncestor(FrameSymbol a, FrameSymbol b)
    {
        while (a.Depth > b.Depth)
        {
            a = a.Parent!;
        }

        while (b.Depth > a.Depth)
        {
            b = b.Parent!;
        }

        while (!ReferenceEquals(a, b))
        {
            a = a.Parent!;
            b = b.Parent!;
        }

        return a;
    }

    public static int Distance(FrameSymbol a, FrameSymbol b) => a.Depth + b.Depth - (2 * CommonAncestor(a, b).Depth);

    /// <summary>The frames strictly below <paramref name="ancestor"/> down to <paramref name="frame"/>, top first.</summary>
    public static List<FrameSymbol> PathBelow(FrameSymbol ancestor, FrameSymbol frame)
    {
        var path = new List<FrameSymbol>();
        for (var f = frame; !ReferenceEquals(f, ancestor); f = f.Parent!)
        {
            path.Add(f);
        }

        path.Reverse();
        return path;
    }

    /// <summary>The next frame on the path from <paramref name="from"/> towards <paramref name="to"/>.</summary>
    public static FrameSymbol StepTowards(FrameSymbol from, FrameSymbol to)
    {
        var ancestor = CommonAncestor(from, to);
        if (!ReferenceEquals(ancestor, from))
        {
            return from.Parent!;
        }

        var f = to;
        while (!ReferenceEquals(f.Parent, from))
        {
            f = f.Parent!;
        }

        return f;
    }

    /// <summary>The first spin link on the path between two frames of one tree, or null when there is none.</summary>
    public static FrameSymbol? SpinLinkBetween(FrameSymbol a, FrameSymbol b)
    {
        var ancestor = CommonAncestor(a, b);
        foreach (var f in PathBelow(ancestor, a).Concat(PathBelow(ancestor, b)))
        {
            if (f.IsSpin)
            {
                return f;
            }
        }

        return null;
    }
}
