namespace MotionSpec.Language.Binding;

/// <summary>
/// The physical dimension of a value as exponents of length and time (angles are (0,0)), or free: a bare
/// number, <c>pi</c>, or a name defined by free values, which adopts whatever dimension its place needs.
/// </summary>
public readonly record struct Dimension(bool IsFree, int Length, int Time)
{
    /// <summary>A value with no fixed dimension.</summary>
    public static Dimension Free => new(true, 0, 0);

    /// <summary>Angles and ratios: (0,0).</summary>
    public static Dimension Dimensionless => new(false, 0, 0);

    /// <summary>Length (1,0).</summary>
    public static Dimension LengthDimension => new(false, 1, 0);

    /// <summary>Time (0,1).</summary>
    public static Dimension TimeDimension => new(false, 0, 1);

    /// <summary>Rate (0,-1), such as an angular velocity.</summary>
    public static Dimension Rate => new(false, 0, -1);

    /// <summary>A fixed dimension with the given exponents.</summary>
    public static Dimension Of(int length, int time) => new(false, length, time);

    /// <summary>True when this is free or equal to <paramref name="required"/>.</summary>
    public bool Accepts(Dimension required) => IsFree || this == required;

    /// <summary>Words an engineer reads: "length", "angle", "m/s^2", "free".</summary>
    public override string ToString()
    {
        if (IsFree)
        {
            return "free";
        }

        switch ((Length, Time))
        {
            case (0, 0): return "angle (dimensionless)";
            case (1, 0): return "length";
            case (0, 1): return "time";
            case (0, -1): return "rate (1/s)";
            case (1, -1): return "speed (m/s)";
            case (1, -2): return "acceleration (m/s^2)";
        }

        return SiUnit();
    }

    /// <summary>The SI unit of this dimension, such as <c>m/s^2</c> or <c>1</c> for angles.</summary>
    public string SiUnit()
    {
        if (IsFree || (Length == 0 && Time == 0))
        {
            return "1";
        }

        var numerator = new List<string>();
        var denominator = new List<string>();
        Part("m", Length);
        Part("s", Time);
        var top = numerator.Count == 0 ? "1" : string.Join("*", numerator);
        return denominator.Count == 0 ? top : top + "/" + string.Join("*", denominator);

        void Part(string unit, int exponent)
        {
            if (exponent == 0)
            {
                return;
            }

            var magnitude = Math.Abs(exponent);
            var text = magnitude == 1 ? unit : unit + "^" + magnitude.ToString(System.Globalization.CultureInfo.InvariantCulture);
            (exponent > 0 ? numerator : denominator).Add(text);
        }
    }
}
