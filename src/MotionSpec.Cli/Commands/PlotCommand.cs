using System.CommandLine;

namespace MotionSpec.Cli.Commands;

/// <summary>
/// <c>motionspec plot FILE -o OUT.svg</c>: the magnitude of each acceleration term of one point report over
/// a time sweep, as SVG or PNG (chosen by the extension).
/// </summary>
internal static class PlotCommand
{
    /// <summary>Builds the command.</summary>
    public static Command Create()
    {
        var file = SpecFileArgument.CreateOne("The .motion spec to plot.");
        var report = new Option<string>("--report")
        {
            Description = "The point report to plot. May be left out when the spec has exactly one point report.",
            HelpName = "NAME",
        };
        var time = StateOptions.CreateTime(
            "0:10ms:10s",
            "The time sweep START:STEP:STOP in seconds (units allowed).");
        var set = StateOptions.CreateSet();
        var output = OutputOption.Create("The image to write: .svg or .png.", required: true);
        var diagnostics = DiagnosticsOption.Create();

        var command = new Command("plot", "Plot the magnitude of each acceleration term of a point report over time (SVG or PNG).")
        {
            file,
            report,
            time,
            set,
            output,
            diagnostics,
        };
        command.SetAction(parseResult => NotYetAvailable.Report("plot", parseResult.InvocationConfiguration.Error));
        return command;
    }
}
