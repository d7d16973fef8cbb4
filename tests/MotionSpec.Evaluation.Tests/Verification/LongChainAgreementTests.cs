using System.Globalization;
using System.Text;
using MotionSpec.Evaluation.Tests.Support;
using Xunit.Abstractions;

namespace MotionSpec.Evaluation.Tests.Verification;

/// <summary>
/// Chains long enough that the kinematics carries vectors across them through composed rotation matrices and
/// gathers origin offsets at the far end first. The closed forms are checked against the independent numeric
/// path (rotation matrices multiplied link by link and differentiated numerically), with a tilted axis, a
/// moving origin and a report whose observer and basis sit inside the chain.
/// </summary>
public sealed class LongChainAgreementTests(ITestOutputHelper output)
{
    [Theory]
    [InlineData(6)]
    [InlineData(9)]
    public void ClosedFormsOfALongArmAgreeWithTheNumericPath(int links)
    {
        var model = Specs.Model(ArmText(links));

        Assert.True(Agreement.TermsSumError(model, 6, links) < 1e-10);
        foreach (var report in Agreement.AgainstNumericPath(model, 4, links))
        {
            output.WriteLine($"{links} links {report.Name}: worst {report.WorstError:E2} ({report.WorstQuantity})");
            Assert.True(report.StatesCompared > 0, report.Name);
            Assert.True(report.WorstError < 1e-8, $"{report.Name}: {report.WorstError:E3} in {report.WorstQuantity}");
        }
    }

    // A demo-style articulated boom: links turn about z, y and a tilted axis in turn, each sits at the end of the
    // one before, the third link's origin slides, and a tool rides a slider on the last link.
    private static string ArmText(int links)
    {
        var text = new StringBuilder();
        text.Append("param a = 0.4 m\ncoord e : length\ncoord s : length\n");
        for (var i = 1; i <= links; i++)
        {
            text.Append(CultureInfo.InvariantCulture, $"coord q{i} : angle\n");
        }

        text.Append("frame yard\n");
        for (var i = 1; i <= links; i++)
        {
            var parent = i == 1 ? "yard" : $"b{i - 1}";
            var axis = (i % 3) switch { 1 => "z", 2 => "y", _ => "[1, 0, 1]" };
            var origin = i == 1 ? string.Empty : i == 3 ? " origin at [a + e, 0, 0.1 m]" : " origin at [a, 0, 0]";
            text.Append(CultureInfo.InvariantCulture, $"frame b{i} in {parent} {{ rotate about {axis} by q{i}{origin} }}\n");
        }

        text.Append(CultureInfo.InvariantCulture, $"point tool in b{links} at [a + s, 0, 0.05 m]\n");
        text.Append("report tool in yard\n");
        text.Append("report tool in yard via b2 basis b3 as toolFromSecondLink\n");
        text.Append(CultureInfo.InvariantCulture, $"report tool in b1 basis b{links} as toolInFirstLink\n");
        text.Append(CultureInfo.InvariantCulture, $"report b{links} in yard\n");
        return text.ToString();
    }
}
