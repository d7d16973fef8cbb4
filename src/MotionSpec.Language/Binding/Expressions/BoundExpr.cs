using MotionSpec.Language.Text;

namespace MotionSpec.Language.Binding.Expressions;

/// <summary>
/// A checked expression: every name resolved, every unit folded into an exact SI constant, a dimension
/// known. Scalars and vectors share this tree; <see cref="IsVector"/> tells which.
/// </summary>
public abstract class BoundExpr(TextSpan span, Dimension dimension, bool isVector)
{
    /// <summary>Where the expression is written.</summary>
    public TextSpan Span { get; } = span;

    /// <summary>Its dimension; for a vector, that of its components.</summary>
    public Dimension Dimension { get; } = dimension;

    /// <summary>True for a vector (three components in some basis), false for a scalar.</summary>
    public bool IsVector { get; } = isVector;
}
