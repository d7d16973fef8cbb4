using System.CommandLine;

namespace MotionSpec.Cli.Commands;

/// <summary>
/// <c>motionspec eval FILE</c>: the numbers of every report at one time or over a sweep, as a table for a
/// person or as CSV or JSON for other tools.
/// </summary>
internal static class EvalCommand
{
    /// <summary>Builds the command.</summary>
    public static Command Create()
    {
        var file = SpecFileArgument.CreateOne("The .motion spec to evaluate.");
        var reports = StateOptions.CreateReports();
        var time = StateOptions.CreateTime(
            "0",
            "The time in seconds, or a sweep START:STEP:STOP (units allowed: 0:100ms:2s).");
        var set = StateOptions.CreateSet();
        var format = new Option<string>("--format")
        {
            Description = "table (aligned, SI units in the header), csv or json (invariant culture, round-trip precision).",
            HelpName = "table|csv|json",
            DefaultValueFactory = _ => "table",
        };
        format.AcceptOnlyFromAmong("table", "csv", "json");
        var diagnostics = DiagnosticsOption.Create();

        var command = new Command("eval", "Evaluate the reports of a spec numerically and print a table, CSV or JSON.")
        {
            file,
            reports,
            time,
            set,
            format,
            diagnostics,
        };
        command.SetAction(parseResult => NotYetAvailable.Report("eval", parseResult.InvocationConfiguration.Error));
        return command;
    }
}
