using System.CommandLine;
using MotionSpec.Compiler;
using MotionSpec.Evaluation.ClosedForm;
using MotionSpec.Evaluation.Inputs;
using MotionSpec.Evaluation.Output;
using MotionSpec.Evaluation.Sweeps;
using MotionSpec.Language.Binding.Symbols;
using MotionSpec.Language.Diagnostics;

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
        command.SetAction(parseResult => Run(
            new Request(
                parseResult.GetValue(file) ?? string.Empty,
                parseResult.GetValue(reports) ?? [],
                parseResult.GetValue(time) ?? "0",
                parseResult.GetValue(set) ?? [],
                parseResult.GetValue(format) ?? "table",
                DiagnosticsOption.Read(parseResult, diagnostics)),
            parseResult.InvocationConfiguration.Output,
            parseResult.InvocationConfiguration.Error));
        return command;
    }

    /// <summary>
    /// Checks the spec, reads the state, evaluates and prints. Exit 2 for a bad command line (before anything
    /// is printed on standard output), 1 for spec errors or a value that is not finite (MOT5, stdout empty).
    /// </summary>
    internal static int Run(Request request, TextWriter stdout, TextWriter stderr)
    {
        // The sweep does not depend on the spec: a wrong --t is reported even for a spec with errors.
        if (!TimeSampleParser.TryParse(request.Time, out var samples, out var timeError))
        {
            return Usage(stderr, timeError!);
        }

        var bytes = SpecFileLoader.TryRead(request.Path, stderr);
        if (bytes is null)
        {
            return ExitCodes.Usage;
        }

        // One writer for the whole run, so that --diagnostics json prints a single array even when MOT5
        // errors follow the checker's warnings.
        var diagnostics = new DiagnosticWriter(stderr, request.Diagnostics);
        var spec = SpecCompiler.Check(request.Path, bytes);
        diagnostics.Add(request.Path, spec.Source, spec.Diagnostics);
        if (spec.HasErrors)
        {
            diagnostics.Complete();
            return ExitCodes.SpecErrors;
        }

        var exitCode = Evaluate(spec, request, samples, stdout, stderr, diagnostics);
        diagnostics.Complete();
        return exitCode;
    }

    private static int Evaluate(CheckedSpec spec, Request request, TimeSamples samples, TextWriter stdout, TextWriter stderr, DiagnosticWriter diagnostics)
    {
        var bound = spec.Bound!;
        if (!SettingParser.TryParse(bound, request.Settings, out var inputs, out var errors))
        {
            foreach (var error in errors)
            {
                stderr.WriteLine($"motionspec: {error}");
            }

            return ExitCodes.Usage;
        }

        var chosen = ChooseReports(bound.Reports, request.Reports, stderr);
        if (chosen is null)
        {
            return ExitCodes.Usage;
        }

        var found = new DiagnosticBag();
        var run = ModelEvaluator.Compile(spec.Model!).Prepare(inputs, samples, chosen, found);

        // Every value is computed once before anything is printed: a sweep that meets a zero denominator
        // halfway must not leave half a table behind.
        if (run is null || !run.CheckFinite(found))
        {
            diagnostics.Add(request.Path, spec.Source, found.Sorted());
            return ExitCodes.SpecErrors;
        }

        switch (request.Format)
        {
            case "csv":
                CsvWriter.Write(run, stdout);
                break;
            case "json":
                JsonReportWriter.Write(run, spec.DisplayName, stdout);
                break;
            default:
                TableWriter.Write(run, stdout);
                break;
        }

        stdout.Flush();
        return ExitCodes.Success;
    }

    private static List<ReportSymbol>? ChooseReports(IReadOnlyList<ReportSymbol> all, IReadOnlyList<string> names, TextWriter stderr)
    {
        if (names.Count == 0)
        {
            return [.. all];
        }

        var unknown = names.Where(n => !all.Any(r => r.Name == n)).Distinct(StringComparer.Ordinal).ToList();
        foreach (var name in unknown)
        {
            var known = all.Count == 0 ? "the spec has no reports" : "reports: " + string.Join(", ", all.Select(r => r.Name));
            stderr.WriteLine($"motionspec: --report '{name}': no report has that name ({known})");
        }

        return unknown.Count > 0 ? null : all.Where(r => names.Contains(r.Name)).ToList();
    }

    private static int Usage(TextWriter stderr, string message)
    {
        stderr.WriteLine($"motionspec: {message}");
        return ExitCodes.Usage;
    }

    /// <summary>What the command line asked for, as typed.</summary>
    internal sealed record Request(
        string Path,
        IReadOnlyList<string> Reports,
        string Time,
        IReadOnlyList<string> Settings,
        string Format,
        DiagnosticFormat Diagnostics);
}
