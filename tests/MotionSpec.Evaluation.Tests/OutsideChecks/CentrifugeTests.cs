using MotionSpec.Evaluation.Tests.Support;

namespace MotionSpec.Evaluation.Tests.OutsideChecks;

public sealed class CentrifugeTests
{
    private const string Centrifuge = """
        title "Bench centrifuge"
        param speed = 3000 rpm
        param radius = 10 cm
        frame lab
        frame rotor in lab {
            rotate about z by speed * t
        }
        point sample in rotor at [radius, 0, 0]
        report sample in lab
        """;

    [Theory]
    [InlineData(3000, 10)]
    [InlineData(12000, 6.5)]
    public void CentripetalTermOverG0MatchesTheRelativeCentrifugalForceRule(double rpm, double radiusCm)
    {
        var v = Specs.At(Centrifuge, "sampleInLab", 0.37, $"speed={rpm} rpm", $"radius={radiusCm} cm");
        var c = v["centripetal"];
        var magnitude = Math.Sqrt((c[0] * c[0]) + (c[1] * c[1]) + (c[2] * c[2]));

        // RCF = 1.118e-5 * r[cm] * rpm^2 (common laboratory practice); its constant is rounded to four
        // digits, so agreement is to about 0.05 %. g0 = 9.80665 m/s^2 by definition.
        var rcf = 1.118e-5 * radiusCm * rpm * rpm;
        Specs.Near(rcf, magnitude / 9.80665, 5e-4);
    }
}
