using System.CommandLine;
using MotionSpec.Evaluation.ClosedForm;
using MotionSpec.Evaluation.Inputs;
using MotionSpec.Evaluation.Sweeps;
using MotionSpec.Kinematics;
using MotionSpec.Language.Binding;
using MotionSpec.Language.Diagnostics;
using MotionSpec.Plotting;

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
        command.SetAction(parseResult => Run(
            new PlotRequest(
                parseResult.GetValue(file) ?? string.Empty,
                parseResult.GetValue(report),
                parseResult.GetValue(time) ?? "0:10ms:10s",
                parseResult.GetValue(set) ?? [],
                parseResult.GetValue(output) ?? string.Empty),
            DiagnosticsOption.Read(parseResult, diagnostics),
            parseResult.InvocationConfiguration.Error));
        return command;
    }

    /// <summary>What one plot invocation asks for.</summary>
    internal sealed record PlotRequest(string Path, string? Report, string Time, IReadOnlyList<string> Settings, string Output);

    /// <summary>
    /// Exit 2 for a wrong command line (extension, report choice, --t, --set, an unwritable output), 1 for
    /// spec errors or values that are not finite, 0 when the image was written.
    /// </summary>
    internal static int Run(PlotRequest request, DiagnosticFormat diagnosticFormat, TextWriter stderr)
    {
        if (PlotImageFormats.FromPath(request.Output) is not { } imageFormat)
        {
            return Usage(stderr, $"the output '{request.Output}' must end in .svg or .png: the extension chooses the image format");
        }

        var status = CheckedSpecLoader.TryLoad(request.Path, diagnosticFormat, stderr, out var spec);
        if (status != ExitCodes.Success || spec?.Model is null)
        {
            return status == ExitCodes.Success ? ExitCodes.SpecErrors : status;
        }

        var model = spec.Model;
        if (ChooseReport(model, request.Report, out var problem) is not { } chosen)
        {
            return Usage(stderr, problem!);
        }

        if (!TimeSampleParser.TryParse(request.Time, out var samples, out var timeError))
        {
            return Usage(stderr, timeError ?? "--t is not a time or a sweep");
        }

        if (!SettingParser.TryParse(model.Spec, request.Settings, out var inputs, out var settingErrors))
        {
            foreach (var error in settingErrors)
            {
                stderr.WriteLine("motionspec plot: " + error);
            }

            return ExitCodes.Usage;
        }

        var found = new DiagnosticBag();
        var run = ModelEvaluator.Compile(model).Prepare(inputs, samples, [chosen.Report], found);
        if (run is null || !run.CheckFinite(found))
        {
            var writer = new DiagnosticWriter(stderr, diagnosticFormat);
            writer.Add(request.Path, spec.Source, found.Sorted());
            writer.Complete();
            return ExitCodes.SpecErrors;
        }

        var data = TermSweepSampler.Sample(spec.DisplayName, run);
        var bytes = TermPlotRenderer.Render(data, imageFormat);
        if (AtomicFileWriter.TryWrite(request.Output, stream => stream.Write(bytes)) is { } writeProblem)
        {
            return Usage(stderr, writeProblem);
        }

        return ExitCodes.Success;
    }

    private static ReportMotion? ChooseReport(KinematicModel model, string? name, out string? problem)
    {
        problem = null;
        var points = model.Reports.Where(r => r.Report.Kind == ReportKind.Point).ToList();
        if (name is null)
        {
            if (points.Count == 1)
            {
                return points[0];
            }

            problem = points.Count == 0
                ? "the spec has no point report to plot (frame reports have no acceleration terms)"
                : "the spec has " + points.Count + " point reports; choose one with --report: " + string.Join(", ", points.Select(p => p.Name));
            return null;
        }

        var named = model.Reports.FirstOrDefault(r => string.Equals(r.Name, name, StringComparison.Ordinal));
        if (named is null)
        {
            problem = $"unknown report '{name}'" + (points.Count == 0 ? string.Empty : "; the point reports are: " + string.Join(", ", points.Select(p => p.Name)));
            return null;
        }

        if (named.Report.Kind != ReportKind.Point)
        {
            problem = $"report '{name}' follows a frame, which has no acceleration terms to plot; choose a point report";
            return null;
        }

        return named;
    }

    private static int Usage(TextWriter stderr, string message)
    {
        stderr.WriteLine("motionspec plot: " + message);
        return ExitCodes.Usage;
    }
}
