using MotionSpec.Language.Binding.Expressions;
using MotionSpec.Language.Text;

namespace MotionSpec.Language.Binding.Symbols;

/// <summary>
/// <c>frame boom in quay { rotate about z by yaw  origin at [0, 0, h] }</c>: a reference frame, a root when
/// it has no parent. A frame has rotations or a spin, never both.
/// </summary>
public sealed class FrameSymbol(string name, TextSpan nameSpan, TextSpan statementSpan, int index, FrameSymbol? parent)
    : Symbol(name, nameSpan, statementSpan)
{
    private readonly List<FrameSymbol> _children = [];
    private readonly List<BoundRotation> _rotations = [];

    /// <summary>Position among the frames, in file order.</summary>
    public int Index { get; } = index;

    /// <summary>The parent frame, or null for a root.</summary>
    public FrameSymbol? Parent { get; } = parent;

    /// <summary>0 for a root, else one more than the parent's.</summary>
    public int Depth { get; } = parent is null ? 0 : parent.Depth + 1;

    /// <summary>The root of this frame's tree.</summary>
    public FrameSymbol Root => Parent?.Root ?? this;

    /// <summary>Children in file order.</summary>
    public IReadOnlyList<FrameSymbol> Children => _children;

    /// <summary>The rotations in the order written (empty when none).</summary>
    public IReadOnlyList<BoundRotation> Rotations => _rotations;

    /// <summary>The origin relative to the parent's origin, or null when omitted (zero by construction).</summary>
    public BoundExpr? Origin { get; private set; }

    /// <summary>Where <c>origin at</c> is written, when it is.</summary>
    public TextSpan? OriginSpan { get; private set; }

    /// <summary>The angular velocity relative to the parent in this frame's basis, or null for no spin.</summary>
    public BoundExpr? Spin { get; private set; }

    /// <summary>Where <c>spin</c> is written, when it is.</summary>
    public TextSpan? SpinSpan { get; private set; }

    /// <summary>True when the frame is known only by its angular velocity (its orientation is unknown).</summary>
    public bool IsSpin => Spin is not null;

    /// <inheritdoc/>
    public override string KindName => "frame";

    /// <summary>Binder use: records a child.</summary>
    public void AddChild(FrameSymbol child) => _children.Add(child);

    /// <summary>Binder use: appends a rotation.</summary>
    public void AddRotation(BoundRotation rotation) => _rotations.Add(rotation);

    /// <summary>Binder use: sets the origin.</summary>
    public void SetOrigin(BoundExpr origin, TextSpan span)
    {
        Origin = origin;
        OriginSpan = span;
    }

    /// <summary>Binder use: sets the spin.</summary>
    public void SetSpin(BoundExpr spin, TextSpan span)
    {
        Spin = spin;
        SpinSpan = span;
    }
}
