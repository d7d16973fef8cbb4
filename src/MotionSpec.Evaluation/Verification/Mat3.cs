namespace MotionSpec.Evaluation.Verification;

/// <summary>
/// A 3x3 matrix of doubles, row-major. As an orientation its columns are a frame's unit vectors written in
/// another frame's basis, so <c>M * v</c> turns components in the frame into components in that other basis.
/// </summary>
internal readonly struct Mat3
{
    private readonly double _m00, _m01, _m02, _m10, _m11, _m12, _m20, _m21, _m22;

    public Mat3(double m00, double m01, double m02, double m10, double m11, double m12, double m20, double m21, double m22)
    {
        _m00 = m00; _m01 = m01; _m02 = m02;
        _m10 = m10; _m11 = m11; _m12 = m12;
        _m20 = m20; _m21 = m21; _m22 = m22;
    }

    public static Mat3 Identity => new(1, 0, 0, 0, 1, 0, 0, 0, 1);

    public double this[int row, int column] => ((row * 3) + column) switch
    {
        0 => _m00, 1 => _m01, 2 => _m02,
        3 => _m10, 4 => _m11, 5 => _m12,
        6 => _m20, 7 => _m21, _ => _m22,
    };

    public Vec3 Column(int column) => column switch
    {
        0 => new(_m00, _m10, _m20),
        1 => new(_m01, _m11, _m21),
        _ => new(_m02, _m12, _m22),
    };

    public Mat3 Transpose() => new(_m00, _m10, _m20, _m01, _m11, _m21, _m02, _m12, _m22);

    public static Mat3 operator *(Mat3 a, Mat3 b) => new(
        (a._m00 * b._m00) + (a._m01 * b._m10) + (a._m02 * b._m20),
        (a._m00 * b._m01) + (a._m01 * b._m11) + (a._m02 * b._m21),
        (a._m00 * b._m02) + (a._m01 * b._m12) + (a._m02 * b._m22),
        (a._m10 * b._m00) + (a._m11 * b._m10) + (a._m12 * b._m20),
        (a._m10 * b._m01) + (a._m11 * b._m11) + (a._m12 * b._m21),
        (a._m10 * b._m02) + (a._m11 * b._m12) + (a._m12 * b._m22),
        (a._m20 * b._m00) + (a._m21 * b._m10) + (a._m22 * b._m20),
        (a._m20 * b._m01) + (a._m21 * b._m11) + (a._m22 * b._m21),
        (a._m20 * b._m02) + (a._m21 * b._m12) + (a._m22 * b._m22));

    public static Mat3 operator +(Mat3 a, Mat3 b) => Combine(a, 1, b, 1);

    public static Mat3 operator *(double k, Mat3 a) => Combine(a, k, a, 0);

    public static Vec3 operator *(Mat3 a, Vec3 v) => new(
        (a._m00 * v.X) + (a._m01 * v.Y) + (a._m02 * v.Z),
        (a._m10 * v.X) + (a._m11 * v.Y) + (a._m12 * v.Z),
        (a._m20 * v.X) + (a._m21 * v.Y) + (a._m22 * v.Z));

    /// <summary>The matrix of <c>v x (.)</c>.</summary>
    public static Mat3 Skew(Vec3 v) => new(0, -v.Z, v.Y, v.Z, 0, -v.X, -v.Y, v.X, 0);

    /// <summary>A right-hand turn by <paramref name="angle"/> about the unit vector <paramref name="n"/> (Rodrigues).</summary>
    public static Mat3 Rotation(Vec3 n, double angle)
    {
        var c = Math.Cos(angle);
        var s = Math.Sin(angle);
        var k = 1 - c;
        return new Mat3(
            c + (k * n.X * n.X), (k * n.X * n.Y) - (s * n.Z), (k * n.X * n.Z) + (s * n.Y),
            (k * n.Y * n.X) + (s * n.Z), c + (k * n.Y * n.Y), (k * n.Y * n.Z) - (s * n.X),
            (k * n.Z * n.X) - (s * n.Y), (k * n.Z * n.Y) + (s * n.X), c + (k * n.Z * n.Z));
    }

    /// <summary>The axial vector of the skew part, (M - M^T)/2, so that Skew(v) gives back v.</summary>
    public Vec3 AxialOfSkewPart() => new((_m21 - _m12) / 2, (_m02 - _m20) / 2, (_m10 - _m01) / 2);

    /// <summary>
    /// The rotation vector (unit axis times angle, the angle in [0, pi]) of a rotation matrix. The angle comes from
    /// atan2 of the skew part's size and the trace, which stays accurate for small turns where acos would not;
    /// a half turn, where the axis cannot be read off the skew part, gives NaN.
    /// </summary>
    public Vec3 RotationVector()
    {
        var axial = AxialOfSkewPart();
        var sine = axial.Norm;
        var cosine = (_m00 + _m11 + _m22 - 1) / 2;
        if (sine == 0)
        {
            return cosine > 0 ? Vec3.Zero : new Vec3(double.NaN, double.NaN, double.NaN);
        }

        return axial * (Math.Atan2(sine, cosine) / sine);
    }

    /// <summary>The nine entries, row-major.</summary>
    public void CopyTo(Span<double> destination)
    {
        destination[0] = _m00; destination[1] = _m01; destination[2] = _m02;
        destination[3] = _m10; destination[4] = _m11; destination[5] = _m12;
        destination[6] = _m20; destination[7] = _m21; destination[8] = _m22;
    }

    /// <summary>A matrix from nine entries, row-major.</summary>
    public static Mat3 From(ReadOnlySpan<double> e) => new(e[0], e[1], e[2], e[3], e[4], e[5], e[6], e[7], e[8]);

    private static Mat3 Combine(Mat3 a, double ka, Mat3 b, double kb) => new(
        (ka * a._m00) + (kb * b._m00), (ka * a._m01) + (kb * b._m01), (ka * a._m02) + (kb * b._m02),
        (ka * a._m10) + (kb * b._m10), (ka * a._m11) + (kb * b._m11), (ka * a._m12) + (kb * b._m12),
        (ka * a._m20) + (kb * b._m20), (ka * a._m21) + (kb * b._m21), (ka * a._m22) + (kb * b._m22));
}
