using System.CommandLine;

namespace MotionSpec.Cli.Commands;

/// <summary>
/// <c>motionspec emit FILE</c>: a self-contained C# evaluator of the spec's reports, compiled in memory
/// before it is written.
/// </summary>
internal static class EmitCommand
{
    /// <summary>Builds the command.</summary>
    public static Command Create()
    {
        var file = SpecFileArgument.CreateOne("The .motion spec to turn into C#.");
        var output = OutputOption.Create("Where to write the .cs file. Default: standard output.", required: false);
        var ns = new Option<string>("--namespace")
        {
            Description = "The namespace of the generated class.",
            HelpName = "NS",
            DefaultValueFactory = _ => "MotionSpec.Generated",
        };
        var className = new Option<string>("--class")
        {
            Description = "The name of the generated static class. Default: the file name in Pascal case.",
            HelpName = "NAME",
        };
        var useFloat = new Option<bool>("--float") { Description = "Generate float arithmetic with MathF instead of double." };
        var stats = new Option<bool>("--stats") { Description = "Also print operation counts of the generated code on standard error." };
        var diagnostics = DiagnosticsOption.Create();

        var command = new Command("emit", "Write an allocation-free C# evaluator for the spec's reports, checked by compiling it.")
        {
            file,
            output,
            ns,
            className,
            useFloat,
            stats,
            diagnostics,
        };
        command.SetAction(parseResult => NotYetAvailable.Report("emit", parseResult.InvocationConfiguration.Error));
        return command;
    }
}
