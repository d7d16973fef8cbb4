using MotionSpec.Language.Binding;

namespace MotionSpec.CSharp.Emission;

/// <summary>SI units as the documentation comments print them.</summary>
internal static class UnitText
{
    public static string Of(Dimension dimension)
    {
        if (dimension.IsFree)
        {
            return "SI units of wherever it is used (no unit written)";
        }

        return dimension.Length == 0 && dimension.Time == 0 ? "rad (or dimensionless)" : dimension.SiUnit();
    }

    public static string CoordValue(CoordKind kind) => kind == CoordKind.Angle ? "rad" : "m";

    public static string CoordRate(CoordKind kind) => kind == CoordKind.Angle ? "rad/s" : "m/s";

    public static string CoordAcceleration(CoordKind kind) => kind == CoordKind.Angle ? "rad/s^2" : "m/s^2";
}
