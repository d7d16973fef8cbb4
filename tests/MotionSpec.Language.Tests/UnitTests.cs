using MotionSpec.Language.Binding;
using MotionSpec.Language.Binding.Expressions;

namespace MotionSpec.Language.Tests;

/// <summary>Unit values against their definitions outside this project.</summary>
public class UnitTests
{
    private static ExactNumber Exact(string quantity)
    {
        var spec = Compile.Clean("param a = " + quantity);
        return Assert.IsType<BoundNumber>(spec.Parameters[0].Definition).Value;
    }

    private static double Value(string quantity) => Compile.Clean("param a = " + quantity).Parameters[0].Value;

    [Fact]
    public void Inch_and_foot_are_exact()
    {
        // International yard and pound agreement (1959): 1 in = 0.0254 m, 1 ft = 0.3048 m exactly.
        Assert.Equal(new ExactNumber(127, 5000, 0), Exact("1 in"));
        Assert.Equal(new ExactNumber(381, 1250, 0), Exact("1 ft"));
        Assert.Equal(0.0254, Value("1 in"));
        Assert.Equal(0.3048, Value("1 ft"));
        Assert.Equal(12 * 0.0254, Value("1 ft / 1 in") * 0.0254, 15);
    }

    [Fact]
    public void Standard_gravity_is_exact()
    {
        // Standard acceleration of gravity 9.80665 m/s^2, by definition (3rd CGPM, 1901).
        Assert.Equal(new ExactNumber(196133, 20000, 0), Exact("1 g0"));
        Assert.Equal(9.80665, Value("1 g0"));
        Assert.Equal(Dimension.Of(1, -2), Compile.Clean("param a = 2 g0").Parameters[0].Dimension);
    }

    [Fact]
    public void Rpm_deg_and_rev_keep_pi_exact()
    {
        // rpm = 2 pi / 60 rad/s and deg = pi / 180 rad, by definition; one revolution is 2 pi rad.
        Assert.Equal(new ExactNumber(1, 50, 1), Exact("0.6 rpm"));
        Assert.Equal(new ExactNumber(1, 180, 1), Exact("1 deg"));
        Assert.Equal(new ExactNumber(2, 1, 1), Exact("1 rev"));
        Assert.Equal(Math.PI / 50, Value("0.6 rpm"));
        Assert.Equal(2 * Math.PI / 60 * 3000, Value("3000 rpm"), 12);
        Assert.Equal(Math.PI / 180 * 10, Value("10 deg/s"), 15);
        Assert.Equal(Dimension.Rate, Compile.Clean("param a = 1 rpm").Parameters[0].Dimension);
    }

    [Fact]
    public void Time_speed_and_length_units_follow_their_si_definitions()
    {
        // SI prefixes and the minute and hour of 60 and 3600 s (SI Brochure, non-SI units accepted for use).
        Assert.Equal(new ExactNumber(1, 100, 0), Exact("1 cm"));
        Assert.Equal(new ExactNumber(1, 1000, 0), Exact("1 mm"));
        Assert.Equal(new ExactNumber(1000, 1, 0), Exact("1 km"));
        Assert.Equal(new ExactNumber(60, 1, 0), Exact("1 min"));
        Assert.Equal(new ExactNumber(3600, 1, 0), Exact("1 h"));
        Assert.Equal(new ExactNumber(1, 10, 0), Exact("100ms"));
        Assert.Equal(new ExactNumber(5, 18, 0), Exact("1 km/h"));
        Assert.Equal(new ExactNumber(1, 1, 0), Exact("3.6 km/h"));
        Assert.Equal(new ExactNumber(12, 1, 0), Exact("12m"));
        Assert.Equal(new ExactNumber(1, 1, 0), Exact("1 m*s^-2"));
        Assert.Equal(Dimension.Of(1, -2), Compile.Clean("param a = 1 m*s^-2").Parameters[0].Dimension);
        Assert.Equal(Dimension.Of(1, -1), Compile.Clean("param a = 5 mm/s").Parameters[0].Dimension);
    }

    [Fact]
    public void Spaces_end_a_unit_so_operators_after_them_are_products()
    {
        var spec = Compile.Clean("coord s : length\nlet v = 2 m / s");
        var division = Assert.IsType<BoundBinary>(spec.Lets[0].Definition);
        Assert.Equal(BoundBinaryOperator.Divide, division.Operator);
        Assert.IsType<BoundCoordReference>(division.Right);
        Assert.Equal(Dimension.Dimensionless, spec.Lets[0].Dimension);
    }

    [Fact]
    public void Exact_numbers_round_correctly()
    {
        // 1/3, 2/3 and 0.1 must be the doubles nearest the exact values (IEEE 754 round to nearest).
        Assert.Equal(1.0 / 3.0, new ExactNumber(1, 3, 0).ToDouble());
        Assert.Equal(2.0 / 3.0, new ExactNumber(2, 3, 0).ToDouble());
        Assert.Equal(0.1, Value("0.1"));
        Assert.Equal(6.02e23, Value("6.02e23"));
        Assert.Equal(1e-300, Value("1e-300"));
        Assert.Equal(double.MaxValue, new ExactNumber(System.Numerics.BigInteger.Parse("179769313486231570814527423731704356798070567525844996598917476803157260780028538760589558632766878171540458953514382464234321326889464182768467546703537516986049910576551282076245490090389328944075868508455133942304583236903222948165808559332123348274797826204144723168738177180919299881250404026184124858368"), 1, 0).ToDouble());
        Assert.Equal(double.PositiveInfinity, new ExactNumber(System.Numerics.BigInteger.Pow(10, 400), 1, 0).ToDouble());
    }
}
