using System.CommandLine;
using MotionSpec.Derivation;

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
        var reports = new Option<string[]>("--report")
        {
            Description = "Derive only this report; repeatable. Default: every report, in file order.",
            HelpName = "NAME",
            Arity = ArgumentArity.OneOrMore,
            AllowMultipleArgumentsPerToken = false,
        };
        var diagnostics = DiagnosticsOption.Create();

        var command = new Command("derive", "Write the symbolic derivation of every report: Markdown, LaTeX or plain text.")
        {
            file,
            output,
            format,
            reports,
            diagnostics,
        };
        command.SetAction(parseResult => Run(
            parseResult.GetValue(file) ?? string.Empty,
            parseResult.GetValue(output),
            parseResult.GetValue(reports) ?? [],
            parseResult.GetValue(format) switch { "latex" => DerivationFormat.Latex, "text" => DerivationFormat.Text, _ => DerivationFormat.Markdown },
            DiagnosticsOption.Read(parseResult, diagnostics),
            parseResult.InvocationConfiguration.Output,
            parseResult.InvocationConfiguration.Error));
        return command;
    }

    /// <summary>
    /// Checks the spec (exit 1 on errors, nothing written), then writes the derivation of every report, or of those named (an unknown name exits 2), to the file, moved into
    /// place only when complete, or to standard output. A file that cannot be read or written exits 2.
    /// </summary>
    internal static int Run(string path, string? outputPath, IReadOnlyList<string> reports, DerivationFormat format, DiagnosticFormat diagnosticFormat, TextWriter stdout, TextWriter stderr)
    {
        var status = CheckedSpecLoader.TryLoad(path, diagnosticFormat, stderr, out var spec);
        if (status != ExitCodes.Success || spec?.Model is null)
        {
            return status == ExitCodes.Success ? ExitCodes.SpecErrors : status;
        }

        var unknown = DerivationWriter.UnknownReports(spec.Model, reports);
        if (unknown.Count > 0)
        {
            stderr.WriteLine($"motionspec derive: unknown report '{unknown[0]}'; the reports are: {string.Join(", ", spec.Model.Reports.Select(r => r.Name))}");
            return ExitCodes.Usage;
        }

        var text = DerivationWriter.Write(spec.Model, spec.DisplayName, format, reports);
        if (outputPath is null)
        {
            stdout.Write(text);
            return ExitCodes.Success;
        }

        if (AtomicFileWriter.TryWriteText(outputPath, text) is { } problem)
        {
            stderr.WriteLine("motionspec derive: " + problem);
            return ExitCodes.Usage;
        }

        return ExitCodes.Success;
    }
}
