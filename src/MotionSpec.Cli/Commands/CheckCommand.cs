using System.CommandLine;
using MotionSpec.Compiler;

namespace MotionSpec.Cli.Commands;

/// <summary>
/// <c>motionspec check FILE...</c>: runs every stage that can find a mistake and prints what it found. It
/// writes no files and, when all is well, prints nothing at all.
/// </summary>
internal static class CheckCommand
{
    /// <summary>Builds the command.</summary>
    public static Command Create()
    {
        var files = SpecFileArgument.CreateMany("One or more .motion spec files.");
        var diagnostics = DiagnosticsOption.Create();
        var command = new Command("check", "Check specs for syntax, name, frame, unit and kinematics errors; print the diagnostics and write nothing.")
        {
            files,
            diagnostics,
        };
        command.SetAction(parseResult => Run(
            parseResult.GetValue(files) ?? [],
            DiagnosticsOption.Read(parseResult, diagnostics),
            parseResult.InvocationConfiguration.Error));
        return command;
    }

    /// <summary>
    /// Checks every file in the order given. If any file cannot be read, each such file is named and nothing
    /// is checked (exit 2). Otherwise exit 1 when any spec has errors, else 0.
    /// </summary>
    internal static int Run(IReadOnlyList<string> paths, DiagnosticFormat format, TextWriter stderr)
    {
        var contents = SpecFileLoader.TryReadAll(paths, stderr);
        if (contents is null)
        {
            return ExitCodes.Usage;
        }

        var diagnostics = new DiagnosticWriter(stderr, format);
        var anyErrors = false;
        for (var i = 0; i < paths.Count; i++)
        {
            var spec = SpecCompiler.Check(paths[i], contents[i]);
            diagnostics.Add(paths[i], spec.Source, spec.Diagnostics);
            anyErrors |= spec.HasErrors;
        }

        diagnostics.Complete();
        return anyErrors ? ExitCodes.SpecErrors : ExitCodes.Success;
    }
}
