using MotionSpec.Evaluation.Tests.Support;

namespace MotionSpec.Evaluation.Tests.OutsideChecks;

public sealed class BeadOnRodTests
{
    private const string Rod = """
        title "Slider on a turning arm"
        coord r : length
        coord theta : angle
        frame ground
        frame rod in ground {
            rotate about z by theta
        }
        point bead in rod at [r, 0, 0]
        report bead in ground basis rod
        """;

    [Theory]
    [InlineData(1.5, 0.4, -0.3, 0.2, 2.0, 0.5)]
    [InlineData(0.2, -1.1, 3.0, -2.5, -0.7, 1.9)]
    public void RadialAndTransverseComponentsMatchPolarKinematics(double r, double rd, double rdd, double th, double thd, double thdd)
    {
        var v = Specs.At(
            Rod,
            "beadInGroundBasisRod",
            0,
            Set("r", r), Set("r'", rd), Set("r''", rdd), Set("theta", th), Set("theta'", thd), Set("theta''", thdd));

        // Polar-coordinate kinematics (any dynamics textbook): radial r'' - r theta'^2, transverse
        // r theta'' + 2 r' theta'.
        Specs.Near([rdd - (r * thd * thd), (r * thdd) + (2 * rd * thd), 0], v["acceleration"], 1e-12);

        // The same split into terms: relative r'' along the rod, Coriolis 2 r' theta' across it.
        Specs.Near([rdd, 0, 0], v["relative"], 1e-12);
        Specs.Near([0, 2 * rd * thd, 0], v["coriolis"], 1e-12);
        Specs.Near([-r * thd * thd, 0, 0], v["centripetal"], 1e-12);
        Specs.Near([0, r * thdd, 0], v["angular"], 1e-12);
    }

    private static string Set(string name, double value) =>
        name + "=" + value.ToString("R", System.Globalization.CultureInfo.InvariantCulture);
}
