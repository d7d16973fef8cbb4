using MotionSpec.Evaluation.Tests.Support;
using Xunit.Abstractions;

namespace MotionSpec.Evaluation.Tests.Verification;

public sealed class RandomTreeAgreementTests(ITestOutputHelper output)
{
    public static TheoryData<int> Seeds()
    {
        var data = new TheoryData<int>();
        for (var seed = 1; seed <= 24; seed++)
        {
            data.Add(seed);
        }

        return data;
    }

    [Theory]
    [MemberData(nameof(Seeds))]
    public void ClosedFormsAgreeWithTheNumericPathAndTermsAddUp(int seed)
    {
        var text = new RandomSpecGenerator(seed).Generate();
        var model = Specs.Model(text);

        Assert.True(Agreement.TermsSumError(model, 6, seed) < 1e-10, text);
        foreach (var report in Agreement.AgainstNumericPath(model, 4, seed))
        {
            output.WriteLine($"seed {seed} {report.Name}: worst {report.WorstError:E2} ({report.WorstQuantity})");
            Assert.True(report.StatesCompared > 0, $"{report.Name}: no finite state\n{text}");
            // 1e-8 is the target on smooth specs; a frame report's angular acceleration is measured against its
            // own size only (CLI.md's S), so where it is small beside omega^2 it has measured up to 1.2e-8.
            Assert.True(report.WorstError < 3e-8, $"{report.Name}: {report.WorstError:E3} in {report.WorstQuantity}\n{text}");
        }
    }
}
