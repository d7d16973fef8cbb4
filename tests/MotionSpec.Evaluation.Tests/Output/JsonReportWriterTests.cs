using System.Text.Json;
using MotionSpec.Evaluation.Output;

namespace MotionSpec.Evaluation.Tests.Output;

public sealed class JsonReportWriterTests
{
    private static JsonElement Write(params string[] reports)
    {
        var writer = new StringWriter();
        JsonReportWriter.Write(OutputFixture.Run(reports), "Slewing crane", writer);
        return JsonDocument.Parse(writer.ToString()).RootElement.Clone();
    }

    [Fact]
    public void ShapeIsTheContractOne()
    {
        var root = Write();
        Assert.Equal(["spec", "reports"], root.EnumerateObject().Select(p => p.Name));
        Assert.Equal("Slewing crane", root.GetProperty("spec").GetString());
        var reports = root.GetProperty("reports").EnumerateArray().ToArray();
        Assert.Equal(2, reports.Length);

        var frame = reports[0];
        Assert.Equal(["name", "kind", "subject", "observer", "basis", "samples"], frame.EnumerateObject().Select(p => p.Name));
        Assert.Equal(("hookInQuay", "frame", "hook", "quay", "quay"), (S(frame, "name"), S(frame, "kind"), S(frame, "subject"), S(frame, "observer"), S(frame, "basis")));
        var frameSample = frame.GetProperty("samples")[0];
        Assert.Equal(["t", "angularVelocity", "angularAcceleration", "originPosition", "originVelocity", "originAcceleration"], frameSample.EnumerateObject().Select(p => p.Name));

        var point = reports[1];
        Assert.Equal(["name", "kind", "subject", "observer", "via", "basis", "samples"], point.EnumerateObject().Select(p => p.Name));
        Assert.Equal(("tipInQuayViaTrolley", "point", "tip", "quay", "trolley", "quay"), (S(point, "name"), S(point, "kind"), S(point, "subject"), S(point, "observer"), S(point, "via"), S(point, "basis")));
        var samples = point.GetProperty("samples").EnumerateArray().ToArray();
        Assert.Equal([0, 0.5, 1], samples.Select(s => s.GetProperty("t").GetDouble()));
        Assert.Equal(["t", "position", "velocity", "acceleration", "terms"], samples[0].EnumerateObject().Select(p => p.Name));
        Assert.Equal(["relative", "centripetal", "angular", "coriolis", "origin"], samples[0].GetProperty("terms").EnumerateObject().Select(p => p.Name));
        Assert.Equal(3, samples[0].GetProperty("terms").GetProperty("coriolis").GetArrayLength());
    }

    [Fact]
    public void ReportsStayInFileOrderWhateverOrderTheyAreAskedFor()
    {
        var root = Write("tipInQuayViaTrolley", "hookInQuay");
        Assert.Equal(["hookInQuay", "tipInQuayViaTrolley"], root.GetProperty("reports").EnumerateArray().Select(r => S(r, "name")));
    }

    [Fact]
    public void NumbersRoundTripExactly()
    {
        var run = OutputFixture.Run("tipInQuayViaTrolley");
        var writer = new StringWriter();
        JsonReportWriter.Write(run, "x", writer);
        var sample = JsonDocument.Parse(writer.ToString()).RootElement.GetProperty("reports")[0].GetProperty("samples")[2];
        var values = new double[run.MaxWidth];
        run.Evaluate(0, 2, values);
        Assert.Equal(values[0..3], sample.GetProperty("position").EnumerateArray().Select(e => e.GetDouble()));
        Assert.Equal(values[18..21], sample.GetProperty("terms").GetProperty("coriolis").EnumerateArray().Select(e => e.GetDouble()));
    }

    [Fact]
    public void LongSweepIsOneValidDocument()
    {
        // Larger than one internal chunk, so the document is handed on in pieces.
        var run = MotionSpec.Evaluation.Tests.Support.Specs.Run(
            MotionSpec.Evaluation.Tests.Support.Specs.Model(OutputFixture.Spec),
            new MotionSpec.Evaluation.Sweeps.TimeSamples(0, 0.01, 2000),
            []);
        var writer = new StringWriter();
        JsonReportWriter.Write(run, "x", writer);
        var reports = JsonDocument.Parse(writer.ToString()).RootElement.GetProperty("reports");
        Assert.Equal(2000, reports[1].GetProperty("samples").GetArrayLength());
        Assert.Equal(19.99, reports[1].GetProperty("samples")[1999].GetProperty("t").GetDouble(), 12);
    }

    [Fact]
    public void OutputIsDeterministic()
    {
        var a = new StringWriter();
        var b = new StringWriter();
        JsonReportWriter.Write(OutputFixture.Run(), "x", a);
        JsonReportWriter.Write(OutputFixture.Run(), "x", b);
        Assert.Equal(a.ToString(), b.ToString());
    }

    private static string? S(JsonElement e, string name) => e.GetProperty(name).GetString();
}
