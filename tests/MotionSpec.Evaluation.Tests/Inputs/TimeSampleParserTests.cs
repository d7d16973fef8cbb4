using MotionSpec.Evaluation.Sweeps;

namespace MotionSpec.Evaluation.Tests.Inputs;

public sealed class TimeSampleParserTests
{
    private static TimeSamples Parse(string text)
    {
        Assert.True(TimeSampleParser.TryParse(text, out var samples, out var error), error);
        return samples;
    }

    private static string Error(string text)
    {
        Assert.False(TimeSampleParser.TryParse(text, out _, out var error));
        Assert.NotNull(error);
        return error;
    }

    [Fact]
    public void SweepWithUnitsHasFloorOfRangeOverStepPlusHalfPlusOneSamples()
    {
        var samples = Parse("0:100ms:2s");
        Assert.Equal(21, samples.Count);
        Assert.Equal(0.1, samples.Step, 15);
        Assert.Equal(2, samples.At(20), 12);
    }

    [Fact]
    public void StopNotOnTheGridRoundsToTheNearestSample()
    {
        // n = floor(1.04 / 0.25 + 0.5) = 4, and floor(1.2 / 0.25 + 0.5) = 5.
        Assert.Equal(5, Parse("0:0.25:1.04").Count);
        Assert.Equal(6, Parse("0:0.25:1.2").Count);
    }

    [Fact]
    public void NegativePartsAreRead()
    {
        var samples = Parse("-1:0.5:-0.5");
        Assert.Equal((-1.0, 0.5, 2), (samples.Start, samples.Step, samples.Count));
    }

    [Fact]
    public void SingleInstantWithAUnit()
    {
        var samples = Parse("1.5 min");
        Assert.Equal((90.0, 1), (samples.Start, samples.Count));
    }

    [Fact]
    public void StartEqualToStopIsOneSample() => Assert.Equal(1, Parse("2:1:2").Count);

    [Fact]
    public void ZeroStepIsRefused() => Assert.Contains("step", Error("0:0:1"), StringComparison.Ordinal);

    [Fact]
    public void NegativeStepIsRefused() => Assert.Contains("step", Error("1:-0.1:0"), StringComparison.Ordinal);

    [Fact]
    public void StopBeforeStartIsRefused() => Assert.Contains("before the start", Error("1:0.1:0"), StringComparison.Ordinal);

    [Fact]
    public void SweepAboveTheLimitNamesTheLimit()
    {
        Assert.Equal(1_000_000, Parse($"0:1:{EvaluationLimits.MaxSamples - 1}").Count);
        var message = Error($"0:1:{EvaluationLimits.MaxSamples}");
        Assert.Contains("1000001 samples", message, StringComparison.Ordinal);
        Assert.Contains("limit of 1000000", message, StringComparison.Ordinal);
    }

    [Fact]
    public void HugeSweepIsRefusedWithoutOverflow() => Assert.Contains("limit", Error("0:1e-300:1e300"), StringComparison.Ordinal);

    [Fact]
    public void LengthIsNotATime() => Assert.Contains("not a time", Error("0:1 m:3"), StringComparison.Ordinal);

    [Fact]
    public void TwoPartsAreRefused() => Assert.Contains("START:STEP:STOP", Error("0:1"), StringComparison.Ordinal);

    [Fact]
    public void GarbageIsRefused() => Assert.Contains("'soon'", Error("soon"), StringComparison.Ordinal);
}
