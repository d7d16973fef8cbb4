namespace MotionSpec.Symbolic;

/// <summary>The elementary functions of the language.</summary>
public enum Function
{
    /// <summary>Sine.</summary>
    Sin,

    /// <summary>Cosine.</summary>
    Cos,

    /// <summary>Tangent.</summary>
    Tan,

    /// <summary>Arc sine.</summary>
    Asin,

    /// <summary>Arc cosine.</summary>
    Acos,

    /// <summary>Arc tangent.</summary>
    Atan,

    /// <summary>Two-argument arc tangent atan2(y, x).</summary>
    Atan2,

    /// <summary>Square root (held canonically as a power with exponent 1/2).</summary>
    Sqrt,

    /// <summary>Natural exponential.</summary>
    Exp,

    /// <summary>Natural logarithm.</summary>
    Ln,
}
