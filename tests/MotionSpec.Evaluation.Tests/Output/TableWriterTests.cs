using MotionSpec.Evaluation.Output;

namespace MotionSpec.Evaluation.Tests.Output;

public sealed class TableWriterTests
{
    private static string[] Lines()
    {
        var writer = new StringWriter();
        TableWriter.Write(OutputFixture.Run(), writer);
        return writer.ToString().Split('\n');
    }

    [Fact]
    public void EveryQuantityCarriesItsSiUnit()
    {
        var text = string.Join('\n', Lines());
        foreach (var label in new[]
                 {
                     "position [m]", "velocity [m/s]", "acceleration [m/s^2]", "coriolis [m/s^2]",
                     "angularVelocity [1/s]", "angularAcceleration [1/s^2]", "originVelocity [m/s]",
                 })
        {
            Assert.Contains(label, text, StringComparison.Ordinal);
        }
    }

    [Fact]
    public void ColumnsAreAlignedWithinAReport()
    {
        var lines = Lines();
        var block = lines.Skip(1).TakeWhile(l => l.Length > 0).ToArray();
        Assert.Equal(1 + (3 * 5), block.Length);
        Assert.All(block, l => Assert.Equal(block[0].Length, l.Length));
    }

    [Fact]
    public void NumbersAreRoundedForReading()
    {
        // The boom turns at 0.6 rpm = 0.02 pi rad/s: six significant digits, no round-trip tails.
        Assert.Contains(Lines(), l => l.Contains("angularVelocity", StringComparison.Ordinal) && l.Contains("0.0628319", StringComparison.Ordinal));
    }

    [Fact]
    public void TheTableEndsWithTheSafetyCaution()
    {
        // The table is what people read and act on: its last line defers to the codes and to a qualified engineer.
        var lines = Lines().Where(l => l.Length > 0).ToArray();
        Assert.Equal(TableWriter.Caution, lines[^1]);
        Assert.Contains("qualified engineer", TableWriter.Caution, StringComparison.Ordinal);
    }
}
