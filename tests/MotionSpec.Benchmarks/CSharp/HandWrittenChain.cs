using System.Runtime.CompilerServices;

namespace MotionSpec.Benchmarks.CSharp;

/// <summary>
/// The arm of <see cref="ChainSpec"/> evaluated the way one would write it by hand: a forward pass over the
/// links carrying the orientation (three column vectors in the base), the angular velocity and acceleration
/// and the origin's position, velocity and acceleration, all in the base. Each elementary rotation updates
/// only the two columns it moves. No allocation: everything lives in locals and the caller's arrays.
/// With <paramref name="pairedTrig"/> each angle's sine and cosine come from one Math.SinCos, as the generated
/// code gets them, so the arithmetic of the two can be compared on equal terms.
/// </summary>
public sealed class HandWrittenChain(int links, bool pairedTrig = false)
{
    public int Links { get; } = links;

    public bool PairedTrig { get; } = pairedTrig;

    /// <summary>Writes the 24 components of PointMotion (position, velocity, acceleration, the five terms).</summary>
    public void Evaluate(double[] q, double[] qd, double[] qdd, double s, double sd, double sdd, double a, double[] output)
    {
        if (PairedTrig)
        {
            Evaluate<OneCall>(q, qd, qdd, s, sd, sdd, a, output);
        }
        else
        {
            Evaluate<SeparateCalls>(q, qd, qdd, s, sd, sdd, a, output);
        }
    }

    // The JIT compiles one copy per struct type argument, so choosing the calls costs the loop nothing.
    // Fully optimised from the first call, as the generated evaluators are, so neither side is timed in a
    // tier of the JIT the other has already left.
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    private void Evaluate<TTrig>(double[] q, double[] qd, double[] qdd, double s, double sd, double sdd, double a, double[] output)
        where TTrig : struct, ITrig
    {
        // Orientation columns: x axis (c0), y axis (c1), z axis (c2) of the current link in the base.
        double c0x = 1, c0y = 0, c0z = 0, c1x = 0, c1y = 1, c1z = 0, c2x = 0, c2y = 0, c2z = 1;
        double wx = 0, wy = 0, wz = 0, ax = 0, ay = 0, az = 0;
        double ox = 0, oy = 0, oz = 0, vx = 0, vy = 0, vz = 0, gx = 0, gy = 0, gz = 0;
        for (var i = 0; i < Links; i++)
        {
            if (i > 0)
            {
                // This link's origin sits at [a, 0, 0] in the previous link, which carries it.
                double dx = a * c0x, dy = a * c0y, dz = a * c0z;
                Cross(wx, wy, wz, dx, dy, dz, out var wdx, out var wdy, out var wdz);
                Cross(wx, wy, wz, wdx, wdy, wdz, out var wwdx, out var wwdy, out var wwdz);
                Cross(ax, ay, az, dx, dy, dz, out var adx, out var ady, out var adz);
                gx += adx + wwdx; gy += ady + wwdy; gz += adz + wwdz;
                vx += wdx; vy += wdy; vz += wdz;
                ox += dx; oy += dy; oz += dz;
            }

            var (sn, c) = TTrig.Of(q[i]);
            double ux, uy, uz;
            if (i % 2 == 0)
            {
                // About z: the z column is the axis and stays; x and y turn.
                ux = c2x; uy = c2y; uz = c2z;
                double nx = (c * c0x) + (sn * c1x), ny = (c * c0y) + (sn * c1y), nz = (c * c0z) + (sn * c1z);
                c1x = (c * c1x) - (sn * c0x); c1y = (c * c1y) - (sn * c0y); c1z = (c * c1z) - (sn * c0z);
                c0x = nx; c0y = ny; c0z = nz;
            }
            else
            {
                // About y: x' = c x - s z, z' = s x + c z.
                ux = c1x; uy = c1y; uz = c1z;
                double nx = (c * c0x) - (sn * c2x), ny = (c * c0y) - (sn * c2y), nz = (c * c0z) - (sn * c2z);
                c2x = (sn * c0x) + (c * c2x); c2y = (sn * c0y) + (c * c2y); c2z = (sn * c0z) + (c * c2z);
                c0x = nx; c0y = ny; c0z = nz;
            }

            // alpha_i = alpha_{i-1} + q'' u + q' (omega_{i-1} x u); omega_i = omega_{i-1} + q' u.
            var rate = qd[i];
            Cross(wx, wy, wz, ux, uy, uz, out var wux, out var wuy, out var wuz);
            ax += (qdd[i] * ux) + (rate * wux); ay += (qdd[i] * uy) + (rate * wuy); az += (qdd[i] * uz) + (rate * wuz);
            wx += rate * ux; wy += rate * uy; wz += rate * uz;
        }

        var length = a + s;
        double rx = length * c0x, ry = length * c0y, rz = length * c0z;
        double ux2 = sd * c0x, uy2 = sd * c0y, uz2 = sd * c0z;
        double relx = sdd * c0x, rely = sdd * c0y, relz = sdd * c0z;
        Cross(wx, wy, wz, rx, ry, rz, out var wrx, out var wry, out var wrz);
        Cross(wx, wy, wz, wrx, wry, wrz, out var cenx, out var ceny, out var cenz);
        Cross(ax, ay, az, rx, ry, rz, out var angx, out var angy, out var angz);
        Cross(wx, wy, wz, ux2, uy2, uz2, out var cx, out var cy, out var cz);
        cx *= 2; cy *= 2; cz *= 2;

        output[0] = ox + rx; output[1] = oy + ry; output[2] = oz + rz;
        output[3] = vx + wrx + ux2; output[4] = vy + wry + uy2; output[5] = vz + wrz + uz2;
        output[6] = relx + cenx + angx + cx + gx; output[7] = rely + ceny + angy + cy + gy; output[8] = relz + cenz + angz + cz + gz;
        output[9] = relx; output[10] = rely; output[11] = relz;
        output[12] = cenx; output[13] = ceny; output[14] = cenz;
        output[15] = angx; output[16] = angy; output[17] = angz;
        output[18] = cx; output[19] = cy; output[20] = cz;
        output[21] = gx; output[22] = gy; output[23] = gz;
    }

    private static void Cross(double ax, double ay, double az, double bx, double by, double bz, out double x, out double y, out double z)
    {
        x = (ay * bz) - (az * by);
        y = (az * bx) - (ax * bz);
        z = (ax * by) - (ay * bx);
    }

    /// <summary>How the sine and cosine of an angle are obtained.</summary>
    private interface ITrig
    {
        static abstract (double Sin, double Cos) Of(double angle);
    }

    private readonly struct SeparateCalls : ITrig
    {
        public static (double Sin, double Cos) Of(double angle) => (Math.Sin(angle), Math.Cos(angle));
    }

    private readonly struct OneCall : ITrig
    {
        public static (double Sin, double Cos) Of(double angle) => Math.SinCos(angle);
    }
}
