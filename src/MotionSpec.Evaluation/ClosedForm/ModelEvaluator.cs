using MotionSpec.Evaluation.Inputs;
using MotionSpec.Evaluation.Sweeps;
using MotionSpec.Kinematics;
using MotionSpec.Language.Binding.Symbols;
using MotionSpec.Language.Diagnostics;

namespace MotionSpec.Evaluation.ClosedForm;

/// <summary>
/// A kinematic model with each report's closed forms compiled once into an evaluation plan, ready to be
/// evaluated at many instants without allocating.
/// </summary>
public sealed class ModelEvaluator
{
    private readonly CompiledReport[] _reports;

    private ModelEvaluator(KinematicModel model)
    {
        Model = model;
        Layout = new InputLayout(model);
        _reports = model.Reports.Select(r => new CompiledReport(r, Layout)).ToArray();
    }

    /// <summary>The model evaluated.</summary>
    public KinematicModel Model { get; }

    internal InputLayout Layout { get; }

    internal IReadOnlyList<CompiledReport> Reports => _reports;

    /// <summary>Compiles every report of <paramref name="model"/>.</summary>
    public static ModelEvaluator Compile(KinematicModel model)
    {
        ArgumentNullException.ThrowIfNull(model);
        return new ModelEvaluator(model);
    }

    /// <summary>
    /// Prepares a sweep of the chosen reports (file order is kept whatever order they are given in). Returns
    /// null, with MOT5 errors in <paramref name="diagnostics"/>, when a derived param is not finite with the
    /// values set.
    /// </summary>
    public EvaluationRun? Prepare(EvaluationInputs inputs, TimeSamples samples, IEnumerable<ReportSymbol> reports, DiagnosticBag diagnostics)
    {
        ArgumentNullException.ThrowIfNull(inputs);
        ArgumentNullException.ThrowIfNull(reports);
        ArgumentNullException.ThrowIfNull(diagnostics);
        var before = diagnostics.Items.Count(d => d.IsError);
        var @params = ParameterResolver.Resolve(Model, inputs, diagnostics);
        if (diagnostics.Items.Count(d => d.IsError) > before)
        {
            return null;
        }

        var chosen = reports.Select(r => r.Index).ToHashSet();
        var selected = _reports.Where(r => chosen.Contains(r.Report.Index)).ToArray();
        return new EvaluationRun(this, selected, @params, inputs, samples);
    }

    /// <summary>Evaluates one report at one state; <paramref name="values"/> holds three doubles per quantity.</summary>
    internal void Evaluate(CompiledReport report, MotionState state, Span<double> inputBuffer, Span<double> values)
    {
        Layout.Fill(state, inputBuffer);
        report.Plan.Evaluate(inputBuffer, values);
    }
}
