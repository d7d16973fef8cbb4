using MotionSpec.Evaluation.Verification;

namespace MotionSpec.Evaluation.Tests.Verification;

public sealed class StepLadderTests
{
    [Theory]
    [InlineData(1e-4)]
    [InlineData(1.0)]
    [InlineData(300.0)]
    public void DerivativesOfKnownFunctionsAreAccurateAtAnyTimeScale(double rate)
    {
        // d/dt sin(w t) = w cos(w t), d2/dt2 = -w^2 sin(w t); d/dt exp(w t) = w exp(w t) (calculus).
        const double t = 0.7;
        var value = new double[2];
        var first = new double[2];
        var second = new double[2];
        StepLadder.Differentiate(
            (time, buffer) =>
            {
                buffer[0] = 5 * Math.Sin(rate * time);
                buffer[1] = Math.Exp(rate * time);
            },
            t,
            2,
            [(0, 1), (1, 1)],
            value,
            first,
            second);

        Assert.Equal(1, first[0] / (5 * rate * Math.Cos(rate * t)), 9);
        Assert.Equal(1, second[0] / (-5 * rate * rate * Math.Sin(rate * t)), 8);
        Assert.Equal(1, first[1] / (rate * Math.Exp(rate * t)), 9);
        Assert.Equal(1, second[1] / (rate * rate * Math.Exp(rate * t)), 8);
    }

    [Fact]
    public void FunctionLeavingItsDomainAtLargeStepsStillGetsItsDerivative()
    {
        // sqrt(1 - t^2) near t = 0.5: large steps give NaN, which must never be chosen.
        var value = new double[1];
        var first = new double[1];
        var second = new double[1];
        StepLadder.Differentiate((time, b) => b[0] = Math.Sqrt(1 - (time * time)), 0.5, 1, [(0, 1)], value, first, second);

        // d/dt sqrt(1 - t^2) = -t / sqrt(1 - t^2); second derivative -1 / (1 - t^2)^(3/2) (calculus).
        Assert.Equal(-0.5 / Math.Sqrt(0.75), first[0], 9);
        Assert.Equal(-1 / Math.Pow(0.75, 1.5), second[0], 8);
    }
}
