using System.CommandLine;

namespace MotionSpec.Cli.Commands;

/// <summary>
/// <c>motionspec verify FILE</c>: compares every closed form with an independent numeric path (rotation
/// matrices, numeric differentiation) at random states and prints the worst relative error per report.
/// </summary>
internal static class VerifyCommand
{
    /// <summary>Builds the command.</summary>
    public static Command Create()
    {
        var file = SpecFileArgument.CreateOne("The .motion spec to verify.");
        var diagnostics = DiagnosticsOption.Create();

        var command = new Command("verify", "Check every closed form against an independent numeric computation at random states.")
        {
            file,
            diagnostics,
        };
        command.SetAction(parseResult => NotYetAvailable.Report("verify", parseResult.InvocationConfiguration.Error));
        return command;
    }
}
