using System.CommandLine;

namespace MotionSpec.Cli.Commands;

/// <summary>
/// <c>motionspec derive FILE</c>: the symbolic derivation of every report, written for a reviewer to follow
/// (Markdown or LaTeX) or for scripts to read back (text).
/// </summary>
internal static class DeriveCommand
{
    /// <summary>Builds the command.</summary>
    public static Command Create()
    {
        var file = SpecFileArgument.CreateOne("The .motion spec to derive.");
        var output = OutputOption.Create("Where to write the derivation. Default: standard output.", required: false);
        var format = new Option<string>("--format")
        {
            Description = "markdown (default), latex, or text (one closed form per line, readable by the spec parser).",
            HelpName = "markdown|latex|text",
            DefaultValueFactory = _ => "markdown",
        };
        format.AcceptOnlyFromAmong("markdown", "latex", "text");
        var diagnostics = DiagnosticsOption.Create();

        var command = new Command("derive", "Write the symbolic derivation of every report: Markdown, LaTeX or plain text.")
        {
            file,
            output,
            format,
            diagnostics,
        };
        command.SetAction(parseResult => NotYetAvailable.Report("derive", parseResult.InvocationConfiguration.Error));
        return command;
    }
}
