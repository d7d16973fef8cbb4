using System.CommandLine;
using MotionSpec.Compiler;
using MotionSpec.Evaluation.Output;
using MotionSpec.Evaluation.Verification;
using MotionSpec.Language.Diagnostics;

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
        command.SetAction(parseResult => Run(
            parseResult.GetValue(file) ?? string.Empty,
            DiagnosticsOption.Read(parseResult, diagnostics),
            parseResult.InvocationConfiguration.Output,
            parseResult.InvocationConfiguration.Error));
        return command;
    }

    /// <summary>
    /// Checks the spec, compares at <see cref="Verifier.DefaultStates"/> seeded random states and prints one
    /// line per report. Exit 0 when every report agrees within <see cref="Verifier.Tolerance"/>, 1 when one
    /// does not (or the spec has errors), 2 when the file cannot be read.
    /// </summary>
    internal static int Run(string path, DiagnosticFormat format, TextWriter stdout, TextWriter stderr)
    {
        var bytes = SpecFileLoader.TryRead(path, stderr);
        if (bytes is null)
        {
            return ExitCodes.Usage;
        }

        var diagnostics = new DiagnosticWriter(stderr, format);
        var spec = SpecCompiler.Check(path, bytes);
        diagnostics.Add(path, spec.Source, spec.Diagnostics);
        if (spec.HasErrors)
        {
            diagnostics.Complete();
            return ExitCodes.SpecErrors;
        }

        var found = new DiagnosticBag();
        var outcome = Verifier.Run(spec.Model!, found);
        diagnostics.Add(path, spec.Source, found.Sorted());
        diagnostics.Complete();
        if (outcome is null)
        {
            return ExitCodes.SpecErrors;
        }

        VerificationWriter.Write(outcome, spec.DisplayName, stdout);
        stdout.Flush();
        return outcome.Passed ? ExitCodes.Success : ExitCodes.SpecErrors;
    }
}
