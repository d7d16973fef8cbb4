namespace MotionSpec.Evaluation.Verification;

/// <summary>Three double components; the numeric path's vector, kept apart from any symbolic type.</summary>
internal readonly record struct Vec3(double X, double Y, double Z)
{
    public static Vec3 Zero => default;

    public double this[int axis] => axis switch { 0 => X, 1 => Y, _ => Z };

    public double Norm => Math.Sqrt((X * X) + (Y * Y) + (Z * Z));

    public bool IsFinite => double.IsFinite(X) && double.IsFinite(Y) && double.IsFinite(Z);

    public static Vec3 operator +(Vec3 a, Vec3 b) => new(a.X + b.X, a.Y + b.Y, a.Z + b.Z);

    public static Vec3 operator -(Vec3 a, Vec3 b) => new(a.X - b.X, a.Y - b.Y, a.Z - b.Z);

    public static Vec3 operator -(Vec3 a) => new(-a.X, -a.Y, -a.Z);

    public static Vec3 operator *(double k, Vec3 a) => new(k * a.X, k * a.Y, k * a.Z);

    public static Vec3 operator *(Vec3 a, double k) => new(k * a.X, k * a.Y, k * a.Z);

    public static Vec3 operator /(Vec3 a, double k) => new(a.X / k, a.Y / k, a.Z / k);

    public static double Dot(Vec3 a, Vec3 b) => (a.X * b.X) + (a.Y * b.Y) + (a.Z * b.Z);

    public static Vec3 Cross(Vec3 a, Vec3 b) =>
        new((a.Y * b.Z) - (a.Z * b.Y), (a.Z * b.X) - (a.X * b.Z), (a.X * b.Y) - (a.Y * b.X));
}
