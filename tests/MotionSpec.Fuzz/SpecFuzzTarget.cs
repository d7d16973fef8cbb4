using System.Globalization;
using MotionSpec.Compiler;
using MotionSpec.CSharp;
using MotionSpec.Derivation;
using MotionSpec.Evaluation.ClosedForm;
using MotionSpec.Evaluation.Inputs;
using MotionSpec.Evaluation.Output;
using MotionSpec.Evaluation.Sweeps;
using MotionSpec.Language.Diagnostics;
using MotionSpec.Language.Text;

namespace MotionSpec.Fuzz;

/// <summary>
/// The one fuzz target, shared by the AFL entry point and the regression tests: the bytes of a spec go through
/// the checker and, when they check clean and the model is small, through eval at one state and the C#
/// emitter (double and float), and for the smaller models the text and Markdown derivations. An exception
/// escaping <see cref="Run"/> is a defect.
/// </summary>
public static class SpecFuzzTarget
{
    /// <summary>The file name diagnostics are reported against.</summary>
    public const string FileName = "fuzz.motion";

    // The back end is far slower than the checker, and the derivations grow fast with the depth of the frame
    // chain (measured warm in Release: a 5-link chain of rotations by coords takes about 1 s for the text
    // derivation and 2 s for the Markdown one, with its symbolic checks). Beyond these sizes a stage is
    // skipped, so that mutated specs keep the executions per second useful and no legal spec looks like a hang.
    internal const int MaxBackEndBytes = 4 * 1024;
    internal const int MaxBackEndFrames = 12;
    internal const int MaxBackEndPoints = 12;
    internal const int MaxBackEndReports = 6;
    internal const int MaxTextFrames = 5;
    internal const int MaxTextReports = 3;
    internal const int MaxDocumentFrames = 4;
    internal const int MaxDocumentReports = 2;

    /// <summary>Runs every stage that applies to <paramref name="bytes"/> and says how far it went.</summary>
    public static FuzzOutcome Run(byte[] bytes)
    {
        ArgumentNullException.ThrowIfNull(bytes);
        var spec = SpecCompiler.Check(FileName, bytes);
        CheckPositions(spec.Diagnostics, spec.Source);
        if (spec.HasErrors != (spec.Model is null))
        {
            throw new FuzzInvariantException("a spec with errors must have no model, and one without errors must have one");
        }

        if (spec.HasErrors)
        {
            return new FuzzOutcome(Codes(spec.Diagnostics), FuzzStage.Check);
        }

        var model = spec.Model!;
        var bound = model.Spec;
        if (bytes.Length > MaxBackEndBytes || bound.Frames.Count > MaxBackEndFrames
            || bound.Points.Count > MaxBackEndPoints || bound.Reports.Count > MaxBackEndReports)
        {
            return new FuzzOutcome(Codes(spec.Diagnostics), FuzzStage.Check);
        }

        var found = new DiagnosticBag();
        var run = ModelEvaluator.Compile(model).Prepare(EvaluationInputs.Defaults(bound), TimeSamples.Default, bound.Reports, found);
        if (run is not null && run.CheckFinite(found))
        {
            using var table = new StringWriter(CultureInfo.InvariantCulture);
            TableWriter.Write(run, table);
        }

        CheckPositions(found.Sorted(), spec.Source);

        var emitted = Emit(spec, useFloat: false);
        var emittedFloat = Emit(spec, useFloat: true);

        if (bound.Frames.Count <= MaxTextFrames && bound.Reports.Count <= MaxTextReports)
        {
            _ = DerivationWriter.Write(model, spec.DisplayName, DerivationFormat.Text);
        }

        if (bound.Frames.Count <= MaxDocumentFrames && bound.Reports.Count <= MaxDocumentReports)
        {
            _ = DerivationWriter.Write(model, spec.DisplayName, DerivationFormat.Markdown);
        }

        return new FuzzOutcome(Codes(spec.Diagnostics.Concat(found.Sorted()).Concat(emitted.Diagnostics).Concat(emittedFloat.Diagnostics)), FuzzStage.BackEnd);
    }

    // Both number types: the float evaluator has range checks of its own.
    private static CSharpEmitResult Emit(CheckedSpec spec, bool useFloat)
    {
        var emitted = CSharpEmitter.Emit(spec, new CSharpEmitOptions(UseFloat: useFloat));
        if (emitted.Succeeded == emitted.Diagnostics.Any(d => d.IsError))
        {
            throw new FuzzInvariantException("the emitter must give either code or an error");
        }

        CheckPositions(emitted.Diagnostics, spec.Source);
        return emitted;
    }

    private static List<string> Codes(IEnumerable<Diagnostic> diagnostics) => diagnostics.Select(d => d.Code).ToList();

    // The command line turns every span into a line and column; a span outside the text would fail there,
    // after the stage that made it has long returned.
    private static void CheckPositions(IEnumerable<Diagnostic> diagnostics, SourceText? specSource)
    {
        foreach (var diagnostic in diagnostics)
        {
            var source = diagnostic.Source ?? specSource;
            var span = diagnostic.Span;
            var length = source?.Content.Length ?? 0;
            if (span.Start < 0 || span.Length < 0 || (source is not null && span.End > length))
            {
                throw new FuzzInvariantException(string.Create(CultureInfo.InvariantCulture,
                    $"{diagnostic.Code} has span {span.Start}+{span.Length} in a text of {length} characters"));
            }

            if (source is not null)
            {
                _ = source.GetLinePosition(span.Start);
                _ = source.GetLinePosition(span.End);
            }
        }
    }
}
