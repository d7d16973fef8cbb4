namespace MotionSpec.Plotting;

/// <summary>A sampled vector's three components in the report's basis, in SI.</summary>
public readonly record struct PlotVector(double X, double Y, double Z)
{
    /// <summary>The Euclidean length.</summary>
    public double Magnitude => Math.Sqrt((X * X) + (Y * Y) + (Z * Z));

    /// <summary>Component 0, 1 or 2.</summary>
    public double this[int axis] => axis switch { 0 => X, 1 => Y, _ => Z };
}
