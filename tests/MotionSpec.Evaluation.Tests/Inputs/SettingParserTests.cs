using MotionSpec.Evaluation.Inputs;
using MotionSpec.Evaluation.Tests.Support;

namespace MotionSpec.Evaluation.Tests.Inputs;

public sealed class SettingParserTests
{
    private const string Crane = """
        param L = 18 m
        param k = 2
        param h = L / 6
        coord psi : angle
        coord s : length
        let yaw = psi + k
        frame quay
        frame boom in quay {
            rotate about z by yaw
        }
        point tip in boom at [L, 0, h]
        report tip in quay
        """;

    private static EvaluationInputs Parse(params string[] settings)
    {
        var spec = Specs.Model(Crane).Spec;
        Assert.True(SettingParser.TryParse(spec, settings, out var inputs, out var errors), string.Join("\n", errors));
        return inputs;
    }

    private static string Error(string setting)
    {
        var spec = Specs.Model(Crane).Spec;
        Assert.False(SettingParser.TryParse(spec, [setting], out _, out var errors));
        return Assert.Single(errors);
    }

    [Fact]
    public void UnitsAreConvertedToSi()
    {
        var inputs = Parse("psi'=10 deg/s", "s=5 cm", "s'=36 km/h", "psi''=-2", "L=2 ft");

        // 1 deg = pi/180 rad, 1 km/h = 1/3.6 m/s, 1 ft = 0.3048 m (definitions of the units).
        Assert.Equal(10 * Math.PI / 180, inputs.Coords[0].Rate, 15);
        Assert.Equal(0.05, inputs.Coords[1].Value, 15);
        Assert.Equal(10, inputs.Coords[1].Rate, 12);
        Assert.Equal(-2, inputs.Coords[0].Acceleration);
        Assert.Equal(0.6096, inputs.ParamOverrides[0]!.Value, 15);
        Assert.Null(inputs.ParamOverrides[2]);
    }

    [Fact]
    public void PlainNumbersAreSiAndSignsAreAllowed()
    {
        var inputs = Parse("L=+12", "k=-.5", "psi=2e-3");
        Assert.Equal(12, inputs.ParamOverrides[0]);
        Assert.Equal(-0.5, inputs.ParamOverrides[1]);
        Assert.Equal(0.002, inputs.Coords[0].Value);
    }

    [Fact]
    public void DerivedParamsAreRecomputedFromOverrides()
    {
        var v = Specs.At(Crane, "tipInQuay", 0, "L=12 m", "k=0");
        Assert.Equal(12, v["position"][0], 12);
        Assert.Equal(2, v["position"][2], 12);
    }

    [Fact]
    public void UnknownNameSuggestsTheClosestParamOrCoord()
    {
        var message = Error("pis=1");
        Assert.Contains("'pis'", message, StringComparison.Ordinal);
        Assert.Contains("did you mean 'psi'?", message, StringComparison.Ordinal);
    }

    [Fact]
    public void DerivedParamCannotBeSet() => Assert.Contains("derived", Error("h=3 m"), StringComparison.Ordinal);

    [Fact]
    public void UnitOfAnotherDimensionIsRefused() => Assert.Contains("speed", Error("psi'=3 m/s"), StringComparison.Ordinal);

    [Fact]
    public void LengthParamRefusesARate() => Assert.Contains("'L'", Error("L=3 rpm"), StringComparison.Ordinal);

    [Fact]
    public void FreeParamTakesOnlyAPlainNumber() => Assert.Contains("without units", Error("k=3 m"), StringComparison.Ordinal);

    [Fact]
    public void MarksOnAParamAreRefused() => Assert.Contains("only coords take marks", Error("L'=3"), StringComparison.Ordinal);

    [Fact]
    public void ThreeMarksAreRefused() => Assert.Contains("at most two", Error("psi'''=3"), StringComparison.Ordinal);

    [Fact]
    public void MissingEqualsIsRefused() => Assert.Contains("NAME=VALUE", Error("psi"), StringComparison.Ordinal);

    [Fact]
    public void ALetIsNotSettable() => Assert.Contains("is a let", Error("yaw=1"), StringComparison.Ordinal);

    [Fact]
    public void UnreadableValueIsRefused() => Assert.StartsWith("--set 'psi=fast'", Error("psi=fast"), StringComparison.Ordinal);

    [Fact]
    public void UnknownUnitIsRefused() => Assert.StartsWith("--set 's=2 furlong'", Error("s=2 furlong"), StringComparison.Ordinal);
}
