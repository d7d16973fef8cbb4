using MotionSpec.Evaluation.Tests.Support;

namespace MotionSpec.Evaluation.Tests.OutsideChecks;

public sealed class EarthTests
{
    // WGS 84: rotation rate 7.292115e-5 rad/s, equatorial radius 6378137 m.
    private const double Omega = 7.292115e-5;
    private const double EquatorialRadius = 6378137;

    // A site frame with x east, y north, z up at latitude lat on the meridian of longitude 0.
    private const string Earth = """
        title "Vehicle on the turning Earth"
        param Omega = 7.292115e-5 rad/s
        param a = 6378137 m
        param lat = 45 deg
        coord e : length
        coord n : length
        frame inertial
        frame earth in inertial {
            rotate about z by Omega * t
        }
        frame site in earth {
            origin at [a * cos(lat), 0, a * sin(lat)]
            rotate about z by pi / 2
            rotate about x by pi / 2 - lat
        }
        point car in site at [e, n, 0]
        report car in inertial via site basis site
        report car in inertial via earth basis site as carViaEarth
        """;

    [Fact]
    public void CoriolisParameterAt45DegreesIsAbout1Point03E4()
    {
        const double speed = 10;
        var north = Specs.At(Earth, "carInInertialViaSiteBasisSite", 0, "n'=10 m/s");
        var east = Specs.At(Earth, "carInInertialViaSiteBasisSite", 0, "e'=36 km/h");
        var f = 2 * Omega * Math.Sin(Math.PI / 4);

        // f = 2 Omega sin(latitude), about 1.03e-4 1/s at 45 degrees (standard in meteorology and
        // oceanography): a northward speed v is deflected east-west by -f v, an eastward one by +f v.
        Specs.Near(-f * speed, north["coriolis"][0], 1e-12);
        Specs.Near(f * speed, east["coriolis"][1], 1e-12);
        Assert.Equal(1.03e-4, -north["coriolis"][0] / speed, 1e-6);
    }

    [Fact]
    public void CentripetalAccelerationAtTheEquatorIsAbout0Point0339()
    {
        var v = Specs.At(Earth, "carViaEarth", 1234, "lat=0");

        // Omega^2 a with the WGS 84 values, about 0.0339 m/s^2 at the equator (WGS 84; common practice),
        // pointing down (towards the axis) in the site's east-north-up basis.
        var expected = Omega * Omega * EquatorialRadius;
        Specs.Near([0, 0, -expected], v["centripetal"], 1e-9, 1e-15);
        Assert.Equal(0.0339, -v["centripetal"][2], 4);
        Specs.Near([0, 0, -expected], v["acceleration"], 1e-9, 1e-15);
    }
}
