using System.CommandLine;

namespace MotionSpec.Cli;

/// <summary>
/// <c>--diagnostics text|json</c>, shared by every command that compiles a spec. Each command adds its own
/// instance (an option belongs to one command) and reads it back with <see cref="Read"/>.
/// </summary>
internal static class DiagnosticsOption
{
    /// <summary>A fresh <c>--diagnostics</c> option, defaulting to text.</summary>
    public static Option<string> Create()
    {
        var option = new Option<string>("--diagnostics")
        {
            Description = "How to print diagnostics on standard error: text (one line each) or json (one array).",
            HelpName = "text|json",
            DefaultValueFactory = _ => "text",
        };
        option.AcceptOnlyFromAmong("text", "json");
        return option;
    }

    /// <summary>The format chosen on the command line.</summary>
    public static DiagnosticFormat Read(ParseResult parseResult, Option<string> option) =>
        string.Equals(parseResult.GetValue(option), "json", StringComparison.Ordinal) ? DiagnosticFormat.Json : DiagnosticFormat.Text;
}
