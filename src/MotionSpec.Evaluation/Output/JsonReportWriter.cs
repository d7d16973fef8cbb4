using System.Buffers;
using System.Text;
using System.Text.Json;
using MotionSpec.Evaluation.ClosedForm;
using MotionSpec.Kinematics;
using MotionSpec.Language.Binding;

namespace MotionSpec.Evaluation.Output;

/// <summary>
/// Writes a run as one JSON document: the spec's name, then each report in file order with its subject,
/// observer, moving frame (point reports), basis and samples. Numbers are SI and round-trip.
/// </summary>
public static class JsonReportWriter
{
    /// <summary>Writes the document to <paramref name="writer"/> (indented, ending with a line end).</summary>
    public static void Write(EvaluationRun run, string specName, TextWriter writer)
    {
        ArgumentNullException.ThrowIfNull(run);
        ArgumentNullException.ThrowIfNull(specName);
        ArgumentNullException.ThrowIfNull(writer);
        var buffer = new ArrayBufferWriter<byte>(1 << 17);
        using var json = new Utf8JsonWriter(buffer, new JsonWriterOptions { Indented = true });
        var values = new double[run.MaxWidth];
        json.WriteStartObject();
        json.WriteString("spec", specName);
        json.WriteStartArray("reports");
        for (var r = 0; r < run.Reports.Count; r++)
        {
            var motion = run.Reports[r];
            var report = motion.Report;
            json.WriteStartObject();
            json.WriteString("name", report.Name);
            json.WriteString("kind", report.Kind == ReportKind.Point ? "point" : "frame");
            json.WriteString("subject", report.SubjectName);
            json.WriteString("observer", report.Observer.Name);
            if (report.Kind == ReportKind.Point && report.Via is { } via)
            {
                json.WriteString("via", via.Name);
            }

            json.WriteString("basis", report.Basis.Name);
            json.WriteStartArray("samples");
            for (var s = 0; s < run.Samples.Count; s++)
            {
                run.Evaluate(r, s, values);
                WriteSample(json, motion, run.Samples.At(s), values);

                // Keep memory flat on long sweeps: hand whole tokens on to the writer as they accumulate.
                if (json.BytesPending + buffer.WrittenCount > 1 << 16)
                {
                    Drain(json, buffer, writer);
                }
            }

            json.WriteEndArray();
            json.WriteEndObject();
        }

        json.WriteEndArray();
        json.WriteEndObject();
        Drain(json, buffer, writer);
        writer.Write('\n');
        writer.Flush();
    }

    private static void Drain(Utf8JsonWriter json, ArrayBufferWriter<byte> buffer, TextWriter writer)
    {
        json.Flush();
        writer.Write(Encoding.UTF8.GetString(buffer.WrittenSpan));
        buffer.ResetWrittenCount();
    }

    private static void WriteSample(Utf8JsonWriter json, ReportMotion motion, double t, double[] values)
    {
        json.WriteStartObject();
        json.WriteNumber("t", t);
        var termsOpen = false;
        for (var i = 0; i < motion.Quantities.Count; i++)
        {
            var quantity = motion.Quantities[i];
            var isTerm = QuantityInfo.Terms.Contains(quantity);
            if (isTerm && !termsOpen)
            {
                json.WriteStartObject("terms");
                termsOpen = true;
            }

            json.WriteStartArray(QuantityInfo.Key(quantity));
            json.WriteNumberValue(values[3 * i]);
            json.WriteNumberValue(values[(3 * i) + 1]);
            json.WriteNumberValue(values[(3 * i) + 2]);
            json.WriteEndArray();
        }

        if (termsOpen)
        {
            json.WriteEndObject();
        }

        json.WriteEndObject();
    }
}
