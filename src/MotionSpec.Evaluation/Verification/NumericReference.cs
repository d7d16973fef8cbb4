using MotionSpec.Language.Binding;
using MotionSpec.Language.Binding.Symbols;

namespace MotionSpec.Evaluation.Verification;

/// <summary>
/// The independent numeric path: every report's vectors at a state, from positions and rotation matrices
/// built out of the bound spec and differentiated numerically in time. It shares nothing with the symbolic
/// engine or the kinematics stage, so agreement between the two is evidence for both.
/// </summary>
internal sealed class NumericReference
{
    // P in A (3), P from B's origin in B (3), B's origin in A (3), B in A (9), B's turn since the sample time (3)
    private const int PointProbe = 21;

    // F's origin in A (3), F in A (9), F's turn since the sample time (3)
    private const int FrameProbe = 15;

    private readonly BoundSpec _spec;
    private readonly int[] _offsets;
    private readonly int _size;

    public NumericReference(BoundSpec spec)
    {
        _spec = spec;
        _offsets = new int[spec.Reports.Count];
        foreach (var report in spec.Reports)
        {
            _offsets[report.Index] = _size;
            if (report.Kind == ReportKind.Point)
            {
                _size += PointProbe;
            }
            else
            {
                _size += FrameProbe;
            }
        }
    }

    /// <summary>
    /// Every report's vectors at <paramref name="state"/>, in the report's basis and JSON order
    /// (<c>[report.Index][quantity]</c>); NaN components where the numeric path could not produce them.
    /// </summary>
    public Vec3[][] Evaluate(MotionState state)
    {
        var scene = new NumericScene(_spec, state);
        scene.Compute(state.Time);
        var atSample = _spec.Reports.Select(report => Relative(scene, report)).ToArray();
        var (value, firsts, seconds) = StepLadder.Estimate((time, buffer) => Probe(scene, atSample, time, buffer), state.Time, _size);
        scene.Compute(state.Time);

        // The vectors are built at every level and the step is chosen per vector: derived quantities such as
        // the skew part of Q'' Q^T cancel errors the raw components do not, so they settle at their own step.
        var perLevel = new Vec3[StepLadder.Levels][][];
        for (var level = 0; level < StepLadder.Levels; level++)
        {
            perLevel[level] = Vectors(scene, value, firsts[level], seconds[level]);
        }

        var results = new Vec3[_spec.Reports.Count][];
        var column = new Vec3[StepLadder.Levels];
        foreach (var report in _spec.Reports)
        {
            var count = perLevel[0][report.Index].Length;
            results[report.Index] = new Vec3[count];
            for (var q = 0; q < count; q++)
            {
                for (var level = 0; level < StepLadder.Levels; level++)
                {
                    column[level] = perLevel[level][report.Index][q];
                }

                results[report.Index][q] = StepLadder.Choose(column);
            }
        }

        return results;
    }

    private Vec3[][] Vectors(NumericScene scene, double[] value, double[] first, double[] second)
    {
        var results = new Vec3[_spec.Reports.Count][];
        foreach (var report in _spec.Reports)
        {
            var o = _offsets[report.Index];
            var observer = scene.Orientations[report.Observer.Index];
            var basis = scene.Orientations[report.Basis.Index].Transpose();
            var observerToBasis = basis * observer;
            var at = o + (report.Kind == ReportKind.Point ? 9 : 3);
            var q = Mat3.From(value.AsSpan(at, 9));

            // With Q the moving frame's axes in the observer's basis and theta(t) the rotation vector of
            // Q(t0)^T Q(t), the turn since the sample time, omega = Q theta' and alpha = Q theta'' at t0 (the
            // rotation vector's Jacobian is I at theta = 0, and its rate contributes theta' x theta' = 0).
            // Differentiating theta rather than Q's entries keeps omega^2, which fills d2Q/dt2, out of alpha:
            // a steady turn is a straight line in theta, so a small alpha beside a large omega^2 stays accurate.
            var turn = at + 9;
            var omega = observerToBasis * (q * At(first, turn));
            var alpha = observerToBasis * (q * At(second, turn));

            if (report.Kind == ReportKind.Point)
            {
                var via = report.Via!;
                var viaToBasis = basis * scene.Orientations[via.Index];
                var r = viaToBasis * At(value, o + 3);
                var relativeVelocity = viaToBasis * At(first, o + 3);
                results[report.Index] =
                [
                    observerToBasis * At(value, o),
                    observerToBasis * At(first, o),
                    observerToBasis * At(second, o),
                    viaToBasis * At(second, o + 3),
                    Vec3.Cross(omega, Vec3.Cross(omega, r)),
                    Vec3.Cross(alpha, r),
                    2 * Vec3.Cross(omega, relativeVelocity),
                    observerToBasis * At(second, o + 6),
                ];
            }
            else
            {
                results[report.Index] =
                [
                    omega,
                    alpha,
                    observerToBasis * At(value, o),
                    observerToBasis * At(first, o),
                    observerToBasis * At(second, o),
                ];
            }
        }

        return results;
    }

    private static Vec3 At(double[] values, int offset) => new(values[offset], values[offset + 1], values[offset + 2]);

    private void Probe(NumericScene scene, Mat3[] atSample, double time, double[] buffer)
    {
        scene.Compute(time);
        foreach (var report in _spec.Reports)
        {
            var o = _offsets[report.Index];
            var observer = scene.Orientations[report.Observer.Index];
            var observerT = observer.Transpose();
            var observerOrigin = scene.Origins[report.Observer.Index];
            var moving = report.Kind == ReportKind.Point ? report.Via! : report.SubjectFrame;
            var movingOrigin = scene.Origins[moving.Index];
            var span = buffer.AsSpan(o);
            if (report.Kind == ReportKind.Point)
            {
                var p = scene.Points[report.Point!.Index];
                Put(span, 0, observerT * (p - observerOrigin));
                Put(span, 3, scene.Orientations[moving.Index].Transpose() * (p - movingOrigin));
                Put(span, 6, observerT * (movingOrigin - observerOrigin));
                PutOrientation(span[9..], scene, report, atSample[report.Index]);
            }
            else
            {
                Put(span, 0, observerT * (movingOrigin - observerOrigin));
                PutOrientation(span[3..], scene, report, atSample[report.Index]);
            }
        }
    }

    /// <summary>The moving frame's axes in the observer's basis (9), then its turn since the sample time (3).</summary>
    private static void PutOrientation(Span<double> span, NumericScene scene, ReportSymbol report, Mat3 atSample)
    {
        var q = Relative(scene, report);
        q.CopyTo(span);
        Put(span, 9, (atSample.Transpose() * q).RotationVector());
    }

    private static Mat3 Relative(NumericScene scene, ReportSymbol report)
    {
        var moving = report.Kind == ReportKind.Point ? report.Via! : report.SubjectFrame;
        return scene.Orientations[report.Observer.Index].Transpose() * scene.Orientations[moving.Index];
    }

    private static void Put(Span<double> span, int at, Vec3 v)
    {
        span[at] = v.X;
        span[at + 1] = v.Y;
        span[at + 2] = v.Z;
    }
}
