using MotionSpec.Evaluation.Tests.Support;

namespace MotionSpec.Evaluation.Tests.OutsideChecks;

public sealed class BodyRatesTests
{
    private const string Airframe = """
        title "Airframe attitude"
        coord psi : angle
        coord theta : angle
        coord phi : angle
        frame world
        frame body in world {
            rotate about z by psi
            rotate about y by theta
            rotate about x by phi
        }
        report body in world basis body
        """;

    [Theory]
    [InlineData(0.3, -0.4, 1.1, 0.7, -1.3, 2.1)]
    [InlineData(-2.0, 0.9, -0.6, -0.2, 0.5, -1.7)]
    public void BodyRatesFollowTheYawPitchRollKinematicEquations(double psi, double theta, double phi, double psiD, double thetaD, double phiD)
    {
        var inv = System.Globalization.CultureInfo.InvariantCulture;
        var v = Specs.At(
            Airframe,
            "bodyInWorldBasisBody",
            0,
            $"psi={psi.ToString(inv)}", $"theta={theta.ToString(inv)}", $"phi={phi.ToString(inv)}",
            $"psi'={psiD.ToString(inv)}", $"theta'={thetaD.ToString(inv)}", $"phi'={phiD.ToString(inv)}");

        // Yaw-pitch-roll (z, then y, then x) body rates (flight-dynamics textbooks; from memory):
        // p = phi' - psi' sin(theta), q = theta' cos(phi) + psi' cos(theta) sin(phi),
        // r = -theta' sin(phi) + psi' cos(theta) cos(phi).
        var p = phiD - (psiD * Math.Sin(theta));
        var q = (thetaD * Math.Cos(phi)) + (psiD * Math.Cos(theta) * Math.Sin(phi));
        var r = (-thetaD * Math.Sin(phi)) + (psiD * Math.Cos(theta) * Math.Cos(phi));
        Specs.Near([p, q, r], v["angularVelocity"], 1e-12);
    }
}
