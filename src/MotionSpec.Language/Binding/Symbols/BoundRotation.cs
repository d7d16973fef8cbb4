using MotionSpec.Language.Binding.Expressions;
using MotionSpec.Language.Text;

namespace MotionSpec.Language.Binding.Symbols;

/// <summary>
/// <c>rotate about z by yaw</c> or <c>rotate about [1, 1, 0] by q</c>: a right-hand turn about an axis of
/// the frame as rotated so far. Exactly one of <see cref="Axis"/> and <see cref="Direction"/> is set;
/// a direction is the bracket as written (not normalised, never zero).
/// </summary>
public sealed class BoundRotation(TextSpan span, Axis? axis, IReadOnlyList<ExactNumber>? direction, BoundExpr angle)
{
    /// <summary>The whole statement.</summary>
    public TextSpan Span { get; } = span;

    /// <summary>A coordinate axis, or null when a bracket direction was written.</summary>
    public Axis? Axis { get; } = axis;

    /// <summary>Three exact components of a written direction, or null for a coordinate axis.</summary>
    public IReadOnlyList<ExactNumber>? Direction { get; } = direction;

    /// <summary>The angle, dimensionless.</summary>
    public BoundExpr Angle { get; } = angle;
}
