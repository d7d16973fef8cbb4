using System.Numerics;
using MotionSpec.Language.Binding.Expressions;
using MotionSpec.Language.Binding.Symbols;

namespace MotionSpec.Evaluation.Verification;

/// <summary>
/// Evaluates bound expressions straight from the binder's trees in doubles, without the symbolic engine:
/// lets are expanded in place (cached per instant), coords move with constant acceleration about the base
/// state, and vectors come out in the components of one common basis (the scene's world basis).
/// </summary>
internal sealed class BoundExprCalculator
{
    private readonly Dictionary<LetSymbol, double> _lets = [];
    private readonly Dictionary<BoundNumber, double> _numbers = [];
    private readonly double[] _params;
    private readonly MotionState _base;
    private readonly Func<FrameSymbol, Mat3> _orientationOf;
    private double _time;

    /// <param name="params">Every param's value by index (derived ones already recomputed).</param>
    /// <param name="baseState">Coords and their marks at the base time.</param>
    /// <param name="orientationOf">A frame's unit vectors in the common basis, at the current instant.</param>
    public BoundExprCalculator(double[] @params, MotionState baseState, Func<FrameSymbol, Mat3> orientationOf)
    {
        _params = @params;
        _base = baseState;
        _orientationOf = orientationOf;
        _time = baseState.Time;
    }

    /// <summary>The instant expressions are evaluated at; setting it forgets the cached lets.</summary>
    public double Time
    {
        get => _time;
        set
        {
            _time = value;
            _lets.Clear();
        }
    }

    /// <summary>A frame whose own basis counts as the common basis while evaluating a spin.</summary>
    public FrameSymbol? BodyBasis { get; set; }

    /// <summary>Evaluates a param definition with the params known so far; used before any instant matters.</summary>
    public static double EvaluateConstant(BoundExpr definition, double[] @params)
    {
        var calculator = new BoundExprCalculator(@params, new MotionState(@params.Length, 0), _ => Mat3.Identity);
        return calculator.Scalar(definition);
    }

    public double Scalar(BoundExpr e)
    {
        switch (e)
        {
            case BoundNumber n:
                // Exact constants convert through big integers; once per literal is enough.
                if (!_numbers.TryGetValue(n, out var number))
                {
                    number = n.Value.ToDouble();
                    _numbers[n] = number;
                }

                return number;
            case BoundTime:
                return _time;
            case BoundParamReference p:
                return _params[p.Param.Index];
            case BoundCoordReference c:
                return Coord(c.Coord.Index, c.Marks);
            case BoundLetReference l:
                if (!_lets.TryGetValue(l.Let, out var value))
                {
                    value = Scalar(l.Let.Definition);
                    _lets[l.Let] = value;
                }

                return value;
            case BoundUnary u:
                return -Scalar(u.Operand);
            case BoundBinary b:
                var left = Scalar(b.Left);
                var right = Scalar(b.Right);
                return b.Operator switch
                {
                    BoundBinaryOperator.Add => left + right,
                    BoundBinaryOperator.Subtract => left - right,
                    BoundBinaryOperator.Multiply => left * right,
                    _ => left / right,
                };
            case BoundPower pw:
                return Power(Scalar(pw.Base), pw.ExponentNumerator, pw.ExponentDenominator);
            case BoundCall call:
                return Call(call);
            case BoundDot dot:
                return Vec3.Dot(Vector(dot.Left), Vector(dot.Right));
            default:
                throw new InvalidOperationException($"not a scalar expression: {e.GetType().Name}");
        }
    }

    public Vec3 Vector(BoundExpr e)
    {
        switch (e)
        {
            case BoundBracket bracket:
                var local = new Vec3(Scalar(bracket.X), Scalar(bracket.Y), Scalar(bracket.Z));
                return Orientation(bracket.Basis) * local;
            case BoundUnitVector unit:
                return Orientation(unit.Frame).Column((int)unit.Axis);
            case BoundUnary u:
                return -Vector(u.Operand);
            case BoundCross cross:
                return Vec3.Cross(Vector(cross.Left), Vector(cross.Right));
            case BoundBinary b:
                return b.Operator switch
                {
                    BoundBinaryOperator.Add => Vector(b.Left) + Vector(b.Right),
                    BoundBinaryOperator.Subtract => Vector(b.Left) - Vector(b.Right),
                    BoundBinaryOperator.Multiply when b.Left.IsVector => Vector(b.Left) * Scalar(b.Right),
                    BoundBinaryOperator.Multiply => Scalar(b.Left) * Vector(b.Right),
                    _ => Vector(b.Left) / Scalar(b.Right),
                };
            default:
                throw new InvalidOperationException($"not a vector expression: {e.GetType().Name}");
        }
    }

    private Mat3 Orientation(FrameSymbol frame) => frame == BodyBasis ? Mat3.Identity : _orientationOf(frame);

    private double Coord(int index, int marks)
    {
        var dt = _time - _base.Time;
        var q = _base.Values[index];
        var rate = _base.Rates[index];
        var acceleration = _base.Accelerations[index];
        return marks switch
        {
            0 => q + (rate * dt) + (0.5 * acceleration * dt * dt),
            1 => rate + (acceleration * dt),
            _ => acceleration,
        };
    }

    private static double Power(double x, BigInteger numerator, BigInteger denominator)
    {
        if (denominator.IsOne && BigInteger.Abs(numerator) <= 64)
        {
            // Integer powers by repeated products keep negative bases exact in sign.
            var n = (int)BigInteger.Abs(numerator);
            var result = 1.0;
            for (var i = 0; i < n; i++)
            {
                result *= x;
            }

            return numerator.Sign < 0 ? 1 / result : result;
        }

        return Math.Pow(x, (double)numerator / (double)denominator);
    }

    private double Call(BoundCall call)
    {
        var x = Scalar(call.Arguments[0]);
        return call.Function switch
        {
            BoundFunction.Sin => Math.Sin(x),
            BoundFunction.Cos => Math.Cos(x),
            BoundFunction.Tan => Math.Tan(x),
            BoundFunction.Asin => Math.Asin(x),
            BoundFunction.Acos => Math.Acos(x),
            BoundFunction.Atan => Math.Atan(x),
            BoundFunction.Atan2 => Math.Atan2(x, Scalar(call.Arguments[1])),
            BoundFunction.Sqrt => Math.Sqrt(x),
            BoundFunction.Exp => Math.Exp(x),
            _ => Math.Log(x),
        };
    }
}
