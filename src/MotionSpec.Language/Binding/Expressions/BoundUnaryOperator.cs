namespace MotionSpec.Language.Binding.Expressions;

/// <summary>Prefix operators.</summary>
public enum BoundUnaryOperator
{
    /// <summary><c>-a</c>.</summary>
    Negate,
}
