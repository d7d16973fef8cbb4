namespace MotionSpec.Symbolic;

/// <summary>The floating-point type C# code is printed for.</summary>
public enum NumericType
{
    /// <summary>double, System.Math.</summary>
    Double,

    /// <summary>float, System.MathF.</summary>
    Float,
}
