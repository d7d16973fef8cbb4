using MotionSpec.Evaluation.Tests.Support;
using Xunit.Abstractions;

namespace MotionSpec.Evaluation.Tests.Verification;

public sealed class DemoSpecAgreementTests(ITestOutputHelper output)
{
    public static TheoryData<string> DemoSpecs()
    {
        var data = new TheoryData<string>();
        foreach (var path in RepositoryFiles.DemoSpecs())
        {
            data.Add(Path.GetFileName(path));
        }

        return data;
    }

    [Fact]
    public void ThereAreDemoSpecs() => Assert.NotEmpty(RepositoryFiles.DemoSpecs());

    [Theory]
    [MemberData(nameof(DemoSpecs))]
    public void ClosedFormsAgreeWithTheNumericPathAndTermsAddUp(string file)
    {
        var path = Path.Combine(RepositoryFiles.Root(), "specs-demo", file);
        var model = Specs.Check(File.ReadAllText(path), path).Model!;

        Assert.True(Agreement.TermsSumError(model, 12, 7) < 1e-10);
        foreach (var report in Agreement.AgainstNumericPath(model, 8, 11))
        {
            output.WriteLine($"{file} {report.Name}: worst {report.WorstError:E2} ({report.WorstQuantity}), {report.StatesCompared} states");
            Assert.True(report.StatesCompared > 0, $"{report.Name}: no state where the closed form is finite");

            // Target accuracy of the numeric path on smooth specs, in CLI.md's error measure.
            Assert.True(report.WorstError < 1e-8, $"{file} {report.Name}: {report.WorstError:E3} in {report.WorstQuantity}");
        }
    }
}
