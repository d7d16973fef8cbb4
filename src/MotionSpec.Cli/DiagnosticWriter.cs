using System.Text;
using System.Text.Encodings.Web;
using System.Text.Json;
using MotionSpec.Language.Diagnostics;
using MotionSpec.Language.Text;

namespace MotionSpec.Cli;

/// <summary>
/// Prints the diagnostics of one run on standard error. Text lines are written as each file is added; JSON is
/// held until <see cref="Complete"/> so that the run prints exactly one array, even an empty one.
/// </summary>
internal sealed class DiagnosticWriter(TextWriter stderr, DiagnosticFormat format)
{
    private static readonly JsonWriterOptions JsonOptions = new()
    {
        Indented = true,
        // Messages quote names ('trolly'); stderr is not HTML, so keep them readable.
        Encoder = JavaScriptEncoder.UnsafeRelaxedJsonEscaping,
    };

    private readonly List<(string File, Diagnostic Diagnostic, LinePosition Start, LinePosition End)> _pending = [];

    /// <summary>Errors seen so far, over all files.</summary>
    public int ErrorCount { get; private set; }

    /// <summary>Warnings seen so far, over all files.</summary>
    public int WarningCount { get; private set; }

    /// <summary>
    /// Adds the diagnostics of one file; <paramref name="file"/> is the path as the user wrote it and
    /// <paramref name="source"/> the spec's text, for diagnostics that do not carry their own.
    /// </summary>
    public void Add(string file, SourceText? source, IEnumerable<Diagnostic> diagnostics)
    {
        foreach (var diagnostic in diagnostics)
        {
            if (diagnostic.IsError)
            {
                ErrorCount++;
            }
            else
            {
                WarningCount++;
            }

            var (start, end) = DiagnosticPosition.Locate(diagnostic, source);
            if (format == DiagnosticFormat.Json)
            {
                _pending.Add((file, diagnostic, start, end));
            }
            else
            {
                stderr.WriteLine(FormatLine(file, diagnostic, start));
            }
        }
    }

    /// <summary>Ends the run: in JSON, writes the one array.</summary>
    public void Complete()
    {
        if (format != DiagnosticFormat.Json)
        {
            return;
        }

        using var buffer = new MemoryStream();
        using (var json = new Utf8JsonWriter(buffer, JsonOptions))
        {
            json.WriteStartArray();
            foreach (var (file, diagnostic, start, end) in _pending)
            {
                json.WriteStartObject();
                json.WriteString("file", file);
                json.WriteNumber("line", start.Line);
                json.WriteNumber("column", start.Column);
                json.WriteNumber("endLine", end.Line);
                json.WriteNumber("endColumn", end.Column);
                json.WriteString("severity", SeverityWord(diagnostic.Severity));
                json.WriteString("code", diagnostic.Code);
                json.WriteString("message", diagnostic.Message);
                json.WriteEndObject();
            }

            json.WriteEndArray();
        }

        stderr.WriteLine(Encoding.UTF8.GetString(buffer.ToArray()));
        _pending.Clear();
    }

    /// <summary>The compiler-convention line: <c>path(line,col): error CODE: message</c>.</summary>
    public static string FormatLine(string file, Diagnostic diagnostic, LinePosition start) =>
        FormattableString.Invariant(
            $"{file}({start.Line},{start.Column}): {SeverityWord(diagnostic.Severity)} {diagnostic.Code}: {OneLine(diagnostic.Message)}");

    private static string SeverityWord(DiagnosticSeverity severity) =>
        severity == DiagnosticSeverity.Error ? "error" : "warning";

    // A line break inside a message would split it into two lines that tools misread.
    private static string OneLine(string message) =>
        message.Contains('\n', StringComparison.Ordinal) || message.Contains('\r', StringComparison.Ordinal)
            ? message.ReplaceLineEndings(" ")
            : message;
}
