using MotionSpec.Evaluation.Verification;

namespace MotionSpec.Evaluation.Tests.Verification;

public sealed class StepLadderTests
{
    private static (double First, double Second) Derivatives(Func<double, double> f, double t)
    {
        var (_, firsts, seconds) = StepLadder.Estimate((time, buffer) => buffer[0] = f(time), t, 1);
        var first = StepLadder.Choose(firsts.Select(d => new Vec3(d[0], 0, 0)).ToArray());
        var second = StepLadder.Choose(seconds.Select(d => new Vec3(d[0], 0, 0)).ToArray());
        return (first.X, second.X);
    }

    [Theory]
    [InlineData(1e-4)]
    [InlineData(1.0)]
    [InlineData(300.0)]
    public void DerivativesOfKnownFunctionsAreAccurateAtAnyTimeScale(double rate)
    {
        // d/dt sin(w t) = w cos(w t), d2/dt2 = -w^2 sin(w t); d/dt exp(w t) = w exp(w t) (calculus).
        const double t = 0.7;
        var (first, second) = Derivatives(time => 5 * Math.Sin(rate * time), t);
        Assert.Equal(1, first / (5 * rate * Math.Cos(rate * t)), 9);
        Assert.Equal(1, second / (-5 * rate * rate * Math.Sin(rate * t)), 8);

        (first, second) = Derivatives(time => Math.Exp(rate * time), t);
        Assert.Equal(1, first / (rate * Math.Exp(rate * t)), 9);
        Assert.Equal(1, second / (rate * rate * Math.Exp(rate * t)), 8);
    }

    [Fact]
    public void FunctionLeavingItsDomainAtLargeStepsStillGetsItsDerivative()
    {
        // d/dt sqrt(1 - t^2) = -t / sqrt(1 - t^2); second derivative -1 / (1 - t^2)^(3/2) (calculus).
        // Large steps leave the domain and give NaN, which must never be chosen.
        var (first, second) = Derivatives(time => Math.Sqrt(1 - (time * time)), 0.5);
        Assert.Equal(-0.5 / Math.Sqrt(0.75), first, 9);
        Assert.Equal(-1 / Math.Pow(0.75, 1.5), second, 8);
    }

    [Fact]
    public void ConstantWithRoundingNoiseHasZeroDerivatives()
    {
        // (1 + x) - x is 1 up to rounding; its derivatives are exactly zero.
        var (first, second) = Derivatives(time => (1 + (1e3 * Math.Sin(time))) - (1e3 * Math.Sin(time)), 0.3);
        Assert.Equal(0, first);
        Assert.Equal(0, second);
    }
}
