using System.Globalization;
using MotionSpec.Evaluation.Inputs;
using MotionSpec.Evaluation.Sweeps;
using MotionSpec.Kinematics;
using MotionSpec.Language.Diagnostics;

namespace MotionSpec.Evaluation.ClosedForm;

/// <summary>
/// The chosen reports of one spec over a set of instants, with params resolved and coords moving with
/// constant acceleration from the values set at the first instant. Samples are computed on demand into the
/// caller's buffer, so a long sweep needs no storage.
/// </summary>
public sealed class EvaluationRun
{
    private readonly ModelEvaluator _evaluator;
    private readonly CompiledReport[] _reports;
    private readonly MotionState _start;
    private readonly MotionState _state;
    private readonly double[] _inputs;

    internal EvaluationRun(ModelEvaluator evaluator, CompiledReport[] reports, double[] @params, EvaluationInputs inputs, TimeSamples samples)
    {
        _evaluator = evaluator;
        _reports = reports;
        Samples = samples;
        var coordCount = inputs.Coords.Count;
        _start = new MotionState(@params.Length, coordCount) { Time = samples.Start };
        @params.CopyTo(_start.Params, 0);
        for (var i = 0; i < coordCount; i++)
        {
            _start.Values[i] = inputs.Coords[i].Value;
            _start.Rates[i] = inputs.Coords[i].Rate;
            _start.Accelerations[i] = inputs.Coords[i].Acceleration;
        }

        _state = _start.Clone();
        _inputs = new double[evaluator.Layout.Symbols.Count];
    }

    /// <summary>The reports evaluated, in file order.</summary>
    public IReadOnlyList<ReportMotion> Reports => _reports.Select(r => r.Motion).ToArray();

    /// <summary>The instants.</summary>
    public TimeSamples Samples { get; }

    /// <summary>The largest number of doubles one sample of any report fills (three per quantity).</summary>
    public int MaxWidth => _reports.Length == 0 ? 0 : _reports.Max(r => r.Width);

    /// <summary>
    /// Writes report <paramref name="report"/> (a position in <see cref="Reports"/>) at sample
    /// <paramref name="sample"/> into <paramref name="values"/>: three components per quantity, in the
    /// report's quantity order.
    /// </summary>
    public void Evaluate(int report, int sample, Span<double> values)
    {
        var t = Samples.At(sample);
        var dt = t - Samples.Start;
        _state.Time = t;
        for (var i = 0; i < _start.Values.Length; i++)
        {
            var rate = _start.Rates[i];
            var acceleration = _start.Accelerations[i];
            _state.Values[i] = _start.Values[i] + (rate * dt) + (0.5 * acceleration * dt * dt);
            _state.Rates[i] = rate + (acceleration * dt);
        }

        _evaluator.Evaluate(_reports[report], _state, _inputs, values);
    }

    /// <summary>
    /// Evaluates everything once and reports, per report, the first sample and quantity that is not finite as
    /// a MOT5 error at the report statement. Returns true when every value is finite.
    /// </summary>
    public bool CheckFinite(DiagnosticBag diagnostics)
    {
        ArgumentNullException.ThrowIfNull(diagnostics);
        var values = new double[MaxWidth];
        var allFinite = true;
        for (var r = 0; r < _reports.Length; r++)
        {
            var compiled = _reports[r];
            for (var s = 0; s < Samples.Count; s++)
            {
                Evaluate(r, s, values);
                var bad = FirstNonFinite(values.AsSpan(0, compiled.Width));
                if (bad < 0)
                {
                    continue;
                }

                allFinite = false;
                var quantity = compiled.Quantities[bad / 3];
                var component = "xyz"[bad % 3];
                var what = double.IsNaN(values[bad]) ? "not a number" : "infinite";
                diagnostics.Error(
                    EvaluationDiagnosticCodes.NotFinite,
                    compiled.Report.StatementSpan,
                    string.Create(
                        CultureInfo.InvariantCulture,
                        $"report '{compiled.Report.Name}' cannot be evaluated at t = {Samples.At(s):R} s: its {QuantityInfo.TradeName(quantity)} ({QuantityInfo.Key(quantity)}.{component}) is {what} there"));
                break;
            }
        }

        return allFinite;
    }

    private static int FirstNonFinite(ReadOnlySpan<double> values)
    {
        for (var i = 0; i < values.Length; i++)
        {
            if (!double.IsFinite(values[i]))
            {
                return i;
            }
        }

        return -1;
    }
}
