using System.Globalization;
using MotionSpec.Evaluation.Output;

namespace MotionSpec.Evaluation.Tests.Output;

public sealed class CsvWriterTests
{
    // CLI.md: report, t, every point quantity in JSON order (terms as relative.x ...), then the frame ones.
    private const string ExpectedHeader =
        "report,t," +
        "position.x,position.y,position.z,velocity.x,velocity.y,velocity.z,acceleration.x,acceleration.y,acceleration.z," +
        "relative.x,relative.y,relative.z,centripetal.x,centripetal.y,centripetal.z,angular.x,angular.y,angular.z," +
        "coriolis.x,coriolis.y,coriolis.z,origin.x,origin.y,origin.z," +
        "angularVelocity.x,angularVelocity.y,angularVelocity.z,angularAcceleration.x,angularAcceleration.y,angularAcceleration.z," +
        "originPosition.x,originPosition.y,originPosition.z,originVelocity.x,originVelocity.y,originVelocity.z," +
        "originAcceleration.x,originAcceleration.y,originAcceleration.z";

    [Fact]
    public void HeaderIsExactlyTheContractOne() => Assert.Equal(ExpectedHeader, CsvWriter.Header());

    [Fact]
    public void RowsPerReportAndInstantInFileOrderWithEmptyCellsOfTheOtherKind()
    {
        var run = OutputFixture.Run();
        var writer = new StringWriter();
        CsvWriter.Write(run, writer);
        var lines = writer.ToString().Split('\n');

        Assert.Equal(ExpectedHeader, lines[0]);
        Assert.Equal(1 + 6 + 1, lines.Length);
        Assert.Equal(string.Empty, lines[^1]);
        var rows = lines[1..^1].Select(l => l.Split(',')).ToArray();
        Assert.All(rows, r => Assert.Equal(41, r.Length));
        Assert.Equal(["hookInQuay", "hookInQuay", "hookInQuay", "tipInQuayViaTrolley", "tipInQuayViaTrolley", "tipInQuayViaTrolley"], rows.Select(r => r[0]));
        Assert.Equal(["0", "0.5", "1"], rows.Take(3).Select(r => r[1]));

        // A frame row leaves the 24 point cells empty; a point row the 15 frame cells.
        Assert.All(rows.Take(3), r => Assert.All(r[2..26], c => Assert.Equal(string.Empty, c)));
        Assert.All(rows.Take(3), r => Assert.All(r[26..], c => Assert.NotEqual(string.Empty, c)));
        Assert.All(rows.Skip(3), r => Assert.All(r[26..], c => Assert.Equal(string.Empty, c)));
        Assert.All(rows.Skip(3), r => Assert.All(r[2..26], c => Assert.NotEqual(string.Empty, c)));
    }

    [Fact]
    public void NumbersRoundTripExactly()
    {
        var run = OutputFixture.Run("tipInQuayViaTrolley");
        var writer = new StringWriter();
        CsvWriter.Write(run, writer);
        var row = writer.ToString().Split('\n')[2].Split(',');
        var values = new double[run.MaxWidth];
        run.Evaluate(0, 1, values);
        for (var i = 0; i < 24; i++)
        {
            Assert.Equal(values[i], double.Parse(row[2 + i], CultureInfo.InvariantCulture));
        }
    }
}
