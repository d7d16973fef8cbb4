namespace MotionSpec.Language.Binding;

/// <summary>How dimensions combine under <c>*</c>, <c>/</c> and powers: free absorbs, fixed exponents add.</summary>
internal static class DimensionRules
{
    /// <summary>Largest exponent a dimension may reach through powers and products.</summary>
    public const long MaxExponent = 1_000_000;

    /// <summary>The dimension of a product (also of dot and cross).</summary>
    public static Dimension Multiply(Dimension a, Dimension b) =>
        a.IsFree || b.IsFree ? Dimension.Free : Clamp((long)a.Length + b.Length, (long)a.Time + b.Time);

    /// <summary>The dimension of a quotient.</summary>
    public static Dimension Divide(Dimension a, Dimension b) =>
        a.IsFree || b.IsFree ? Dimension.Free : Clamp((long)a.Length - b.Length, (long)a.Time - b.Time);

    /// <summary>Exponents times an integer, or null when they grow beyond <see cref="MaxExponent"/>.</summary>
    public static Dimension? Power(Dimension a, long exponent)
    {
        if (a.IsFree)
        {
            return Dimension.Free;
        }

        var length = a.Length * exponent;
        var time = a.Time * exponent;
        return Math.Abs(length) > MaxExponent || Math.Abs(time) > MaxExponent ? null : Dimension.Of((int)length, (int)time);
    }

    private static Dimension Clamp(long length, long time) =>
        Dimension.Of((int)Math.Max(-MaxExponent, Math.Min(MaxExponent, length)), (int)Math.Max(-MaxExponent, Math.Min(MaxExponent, time)));
}
