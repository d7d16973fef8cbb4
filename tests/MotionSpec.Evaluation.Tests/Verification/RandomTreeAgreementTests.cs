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
            // The target of the issue: 1e-8 in CLI.md's error measure, every report of every tree.
            Assert.True(report.WorstError < 1e-8, $"{report.Name}: {report.WorstError:E3} in {report.WorstQuantity}\n{text}");
        }
    }
}
