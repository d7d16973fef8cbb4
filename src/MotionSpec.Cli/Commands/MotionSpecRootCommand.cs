using System.CommandLine;

namespace MotionSpec.Cli.Commands;

/// <summary>The <c>motionspec</c> root: one subcommand per job, each defined in its own file.</summary>
internal static class MotionSpecRootCommand
{
    /// <summary>Builds the whole command tree.</summary>
    public static RootCommand Create() =>
        new("motionspec: compile .motion specs of moving frames and points into checked accelerations, split into relative, centripetal, angular-acceleration, Coriolis and origin terms.")
        {
            CheckCommand.Create(),
            EvalCommand.Create(),
            EmitCommand.Create(),
            DeriveCommand.Create(),
            PlotCommand.Create(),
            VerifyCommand.Create(),
        };
}
