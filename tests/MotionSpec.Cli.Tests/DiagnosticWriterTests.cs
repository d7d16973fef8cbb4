using System.Text.Json;
using MotionSpec.Language.Diagnostics;
using MotionSpec.Language.Text;

namespace MotionSpec.Cli.Tests;

/// <summary>The printing of diagnostics on its own, with hand-made diagnostics over known text.</summary>
public sealed class DiagnosticWriterTests
{
    private static string Print(DiagnosticFormat format, string file, SourceText? source, params Diagnostic[] diagnostics)
    {
        using var stderr = new StringWriter();
        var writer = new DiagnosticWriter(stderr, format);
        writer.Add(file, source, diagnostics);
        writer.Complete();
        return stderr.ToString();
    }

    [Fact]
    public void Warning_uses_the_word_warning_and_the_same_shape()
    {
        var source = new SourceText("w.motion", "frame quay\nparam unused = 2 m\n");
        var warning = new Diagnostic("MOT2901", DiagnosticSeverity.Warning, new TextSpan(17, 6), "param 'unused' is never used");

        var text = Print(DiagnosticFormat.Text, "w.motion", source, warning);

        Assert.Equal("w.motion(2,7): warning MOT2901: param 'unused' is never used" + Environment.NewLine, text);
    }

    [Fact]
    public void Message_with_a_line_break_stays_on_one_line()
    {
        var source = new SourceText("a.motion", "frame quay\n");
        var error = new Diagnostic("MOT1001", DiagnosticSeverity.Error, new TextSpan(0, 5), "first\nsecond\r\nthird");

        var text = Print(DiagnosticFormat.Text, "a.motion", source, error);

        Assert.Equal("a.motion(1,1): error MOT1001: first second third" + Environment.NewLine, text);
    }

    [Fact]
    public void Span_across_lines_gives_an_exclusive_end_on_the_later_line()
    {
        var source = new SourceText("a.motion", "frame boom in quay {\n\trotate about z by 𝛚\n}\n");
        // From 'rotate' (offset 22) to just past the surrogate pair (2 UTF-16 units) that ends line 2.
        var start = source.Content.IndexOf("rotate", StringComparison.Ordinal);
        var end = source.Content.IndexOf('\n', start);
        var error = new Diagnostic("MOT2001", DiagnosticSeverity.Error, new TextSpan(start, end - start), "x");

        var json = Print(DiagnosticFormat.Json, "a.motion", source, error);

        using var doc = JsonDocument.Parse(json);
        var item = doc.RootElement[0];
        Assert.Equal(2, item.GetProperty("line").GetInt32());
        Assert.Equal(2, item.GetProperty("column").GetInt32()); // the tab is one column
        Assert.Equal(2, item.GetProperty("endLine").GetInt32());
        // "\trotate about z by " is 19 scalar values, the letter is the 20th, the end is one past it.
        Assert.Equal(21, item.GetProperty("endColumn").GetInt32());
    }

    [Fact]
    public void Json_escapes_quotes_and_backslashes_and_round_trips_the_text()
    {
        var source = new SourceText(@"C:\specs\crane.motion", "title \"x\"\n");
        const string message = "title \"Crane\\Hoist\" is 'odd' — see ü";
        var error = new Diagnostic("MOT1002", DiagnosticSeverity.Error, new TextSpan(6, 3), message);

        var json = Print(DiagnosticFormat.Json, @"C:\specs\crane.motion", source, error);

        using var doc = JsonDocument.Parse(json);
        Assert.Equal(@"C:\specs\crane.motion", doc.RootElement[0].GetProperty("file").GetString());
        Assert.Equal(message, doc.RootElement[0].GetProperty("message").GetString());
        Assert.Contains("'odd'", json, StringComparison.Ordinal); // readable, not \u0027
    }

    [Fact]
    public void Counts_errors_and_warnings_across_files()
    {
        var source = new SourceText("a.motion", "frame quay\n");
        using var stderr = new StringWriter();
        var writer = new DiagnosticWriter(stderr, DiagnosticFormat.Text);

        writer.Add("a.motion", source, [new Diagnostic("MOT1001", DiagnosticSeverity.Error, new TextSpan(0, 1), "e")]);
        writer.Add("b.motion", source, [new Diagnostic("MOT2901", DiagnosticSeverity.Warning, new TextSpan(0, 1), "w"), new Diagnostic("MOT2902", DiagnosticSeverity.Warning, new TextSpan(0, 1), "w")]);

        Assert.Equal(1, writer.ErrorCount);
        Assert.Equal(2, writer.WarningCount);
    }

    [Fact]
    public void A_diagnostic_carrying_its_own_text_is_located_in_that_text()
    {
        var spec = new SourceText("a.motion", "frame quay\n");
        var own = new SourceText("a.motion", "line one\nline two");
        var error = new Diagnostic("MOT1001", DiagnosticSeverity.Error, new TextSpan(14, 0), "bad byte") { Source = own };

        var text = Print(DiagnosticFormat.Text, "a.motion", spec, error);

        Assert.Equal("a.motion(2,6): error MOT1001: bad byte" + Environment.NewLine, text);
    }

    [Fact]
    public void Without_any_text_the_diagnostic_is_placed_at_the_start_of_the_file()
    {
        using var stderr = new StringWriter();
        var writer = new DiagnosticWriter(stderr, DiagnosticFormat.Text);

        writer.Add("big.motion", null, [new Diagnostic("MOT1002", DiagnosticSeverity.Error, new TextSpan(0, 0), "too large")]);

        Assert.Equal("big.motion(1,1): error MOT1002: too large" + Environment.NewLine, stderr.ToString());
    }

    [Fact]
    public void Text_mode_prints_nothing_when_there_is_nothing_to_say()
    {
        var text = Print(DiagnosticFormat.Text, "a.motion", new SourceText("a.motion", "frame quay\n"));

        Assert.Equal(string.Empty, text);
    }
}
