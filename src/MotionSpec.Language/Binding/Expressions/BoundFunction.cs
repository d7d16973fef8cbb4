namespace MotionSpec.Language.Binding.Expressions;

/// <summary>The scalar functions of the language.</summary>
public enum BoundFunction
{
    /// <summary><c>sin(x)</c>.</summary>
    Sin,

    /// <summary><c>cos(x)</c>.</summary>
    Cos,

    /// <summary><c>tan(x)</c>.</summary>
    Tan,

    /// <summary><c>asin(x)</c>.</summary>
    Asin,

    /// <summary><c>acos(x)</c>.</summary>
    Acos,

    /// <summary><c>atan(x)</c>.</summary>
    Atan,

    /// <summary><c>atan2(y, x)</c>.</summary>
    Atan2,

    /// <summary><c>sqrt(x)</c>.</summary>
    Sqrt,

    /// <summary><c>exp(x)</c>.</summary>
    Exp,

    /// <summary><c>ln(x)</c>.</summary>
    Ln,
}
