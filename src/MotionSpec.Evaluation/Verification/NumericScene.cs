using MotionSpec.Language.Binding;
using MotionSpec.Language.Binding.Symbols;

namespace MotionSpec.Evaluation.Verification;

/// <summary>
/// The whole frame tree at one instant, built from the bound spec alone: each frame's unit vectors and
/// origin, and each point, in the basis of the tree's root (all roots share it). Rotations compose
/// intrinsically (R1 R2 ... Rn); a spin frame is taken at the identity at the base time and its body rates are
/// integrated from there (fourth-order Magnus steps, better than RK4 here because they stay rotations).
/// </summary>
internal sealed class NumericScene
{
    // A fixed number of steps whatever the span: the integrated orientation is then a smooth function of the
    // instant whose first four derivatives at the base time are exact, so finite differences see no kink.
    private const int SpinSteps = 8;
    private static readonly double GaussLow = 0.5 - (Math.Sqrt(3) / 6);
    private static readonly double GaussHigh = 0.5 + (Math.Sqrt(3) / 6);

    private readonly BoundSpec _spec;
    private readonly BoundExprCalculator _calculator;
    private readonly MotionState _base;

    public NumericScene(BoundSpec spec, MotionState baseState)
    {
        _spec = spec;
        _base = baseState;
        Orientations = new Mat3[spec.Frames.Count];
        Origins = new Vec3[spec.Frames.Count];
        Points = new Vec3[spec.Points.Count];
        var @params = ParamValues(spec, baseState.Params);
        _calculator = new BoundExprCalculator(@params, baseState, f => Orientations[f.Index]);
    }

    /// <summary>Each frame's unit vectors (columns) in the common basis.</summary>
    public Mat3[] Orientations { get; }

    /// <summary>Each frame's origin in the common basis, from the common origin.</summary>
    public Vec3[] Origins { get; }

    /// <summary>Each point's position in the common basis, from the common origin.</summary>
    public Vec3[] Points { get; }

    /// <summary>
    /// Recomputes the params in file order from the bound definitions, keeping the given value of every
    /// independent param, so that derived ones never come from the closed-form path.
    /// </summary>
    public static double[] ParamValues(BoundSpec spec, double[] given)
    {
        var values = new double[spec.Parameters.Count];
        foreach (var param in spec.Parameters)
        {
            values[param.Index] = param.IsDerived
                ? BoundExprCalculator.EvaluateConstant(param.Definition, values)
                : given[param.Index];
        }

        return values;
    }

    /// <summary>Places every frame and point at <paramref name="time"/>.</summary>
    public void Compute(double time)
    {
        _calculator.Time = time;
        foreach (var frame in _spec.Frames)
        {
            var parentOrientation = frame.Parent is null ? Mat3.Identity : Orientations[frame.Parent.Index];
            var parentOrigin = frame.Parent is null ? Vec3.Zero : Origins[frame.Parent.Index];
            var local = frame.IsSpin ? IntegrateSpin(frame, time) : Rotations(frame);
            Orientations[frame.Index] = parentOrientation * local;

            // The origin is written in the parent's basis (or a named one), which is already placed.
            Origins[frame.Index] = frame.Origin is null ? parentOrigin : parentOrigin + _calculator.Vector(frame.Origin);
        }

        foreach (var point in _spec.Points)
        {
            Points[point.Index] = Origins[point.Frame.Index] + _calculator.Vector(point.Position);
        }
    }

    private Mat3 Rotations(FrameSymbol frame)
    {
        var product = Mat3.Identity;
        foreach (var rotation in frame.Rotations)
        {
            var angle = _calculator.Scalar(rotation.Angle);
            product *= Mat3.Rotation(AxisOf(rotation), angle);
        }

        return product;
    }

    private static Vec3 AxisOf(BoundRotation rotation)
    {
        if (rotation.Axis is { } axis)
        {
            return axis switch { Axis.X => new Vec3(1, 0, 0), Axis.Y => new Vec3(0, 1, 0), _ => new Vec3(0, 0, 1) };
        }

        var d = rotation.Direction!;
        var v = new Vec3(d[0].ToDouble(), d[1].ToDouble(), d[2].ToDouble());
        return v / v.Norm;
    }

    private Mat3 IntegrateSpin(FrameSymbol frame, double time)
    {
        var start = _base.Time;
        var h = (time - start) / SpinSteps;
        var r = Mat3.Identity;
        if (h != 0)
        {
            // Fourth-order Magnus steps on dR/dt = R [w]x (w the body rates, in the frame's own basis), with
            // the rates at the two Gauss points. Each step is an exact rotation, so R stays orthogonal and a
            // pose that is fixed relative to the spin frame stays fixed to rounding.
            _calculator.BodyBasis = frame;
            for (var i = 0; i < SpinSteps; i++)
            {
                var s = start + (i * h);
                var w1 = Rates(frame, s + (GaussLow * h));
                var w2 = Rates(frame, s + (GaussHigh * h));
                var step = ((h / 2) * (w1 + w2)) - (Math.Sqrt(3) / 12 * h * h * Vec3.Cross(w2, w1));
                var angle = step.Norm;
                r *= angle == 0 ? Mat3.Identity : Mat3.Rotation(step / angle, angle);
            }

            _calculator.BodyBasis = null;
        }

        _calculator.Time = time;
        return r;
    }

    private Vec3 Rates(FrameSymbol frame, double instant)
    {
        _calculator.Time = instant;
        return _calculator.Vector(frame.Spin!);
    }
}
