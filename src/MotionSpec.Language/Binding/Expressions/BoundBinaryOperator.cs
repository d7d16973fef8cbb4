namespace MotionSpec.Language.Binding.Expressions;

/// <summary>Infix arithmetic operators (<c>^</c> is <see cref="BoundPower"/>).</summary>
public enum BoundBinaryOperator
{
    /// <summary><c>a + b</c>: scalars, or vectors.</summary>
    Add,

    /// <summary><c>a - b</c>: scalars, or vectors.</summary>
    Subtract,

    /// <summary><c>a * b</c>: scalars, or a scalar and a vector in either order.</summary>
    Multiply,

    /// <summary><c>a / b</c>: scalars, or a vector divided by a scalar.</summary>
    Divide,
}
