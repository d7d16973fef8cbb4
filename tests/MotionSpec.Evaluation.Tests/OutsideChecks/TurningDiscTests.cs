using MotionSpec.Evaluation.Tests.Support;

namespace MotionSpec.Evaluation.Tests.OutsideChecks;

public sealed class TurningDiscTests
{
    private const string Disc = """
        title "Turntable with a rim marker"
        param r = 25 cm
        coord theta : angle
        frame ground
        frame disc in ground {
            rotate about z by theta
        }
        point rim in disc at [r, 0, 0]
        report rim in ground basis disc
        """;

    [Fact]
    public void RimAccelerationIsMinusOmegaSquaredRadiallyAndAlphaRTangentially()
    {
        const double w = 3, alpha = -2, r = 0.25;
        var v = Specs.At(Disc, "rimInGroundBasisDisc", 0, "theta=0.7", "theta'=3", "theta''=-2");

        // A point fixed on a disc turning about its axis: -w^2 r along the radius, alpha r along the tangent
        // (common practice).
        Specs.Near([-w * w * r, alpha * r, 0], v["acceleration"], 1e-12);
        Specs.Near([-w * w * r, 0, 0], v["centripetal"], 1e-12);
        Specs.Near([0, alpha * r, 0], v["angular"], 1e-12);
        Specs.Near([0, 0, 0], v["relative"], 0);
        Specs.Near([0, 0, 0], v["coriolis"], 0);
        Specs.Near([0, 0, 0], v["origin"], 0);

        // Speed w r along the tangent (common practice).
        Specs.Near([0, w * r, 0], v["velocity"], 1e-12);
        Specs.Near([r, 0, 0], v["position"], 1e-12);
    }

    [Fact]
    public void DegreesPerSecondAreConvertedToSi()
    {
        var v = Specs.At(Disc, "rimInGroundBasisDisc", 0, "theta'=180 deg/s");

        // 180 deg/s is pi rad/s by the definition of the degree.
        Specs.Near(-Math.PI * Math.PI * 0.25, v["acceleration"][0], 1e-12);
    }
}
