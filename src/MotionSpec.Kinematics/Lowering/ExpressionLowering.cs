using MotionSpec.Kinematics.Frames;
using MotionSpec.Language.Binding;
using MotionSpec.Language.Binding.Expressions;
using MotionSpec.Language.Binding.Symbols;
using MotionSpec.Symbolic;

using Symbol = MotionSpec.Symbolic.Symbol;

namespace MotionSpec.Kinematics.Lowering;

/// <summary>
/// Turns bound expressions into symbolic ones: params and coords become symbols, lets are substituted, units
/// are already exact SI constants. Vectors become <see cref="FrameVector"/>s with a part per basis named.
/// </summary>
internal sealed class ExpressionLowering
{
    private readonly Dictionary<LetSymbol, Expr> _lets = [];
    private BasisConverter? _converter;

    /// <summary>The converter used by cross and dot; set once the orientations exist (they need scalar lowering).</summary>
    public void UseConverter(BasisConverter converter) => _converter = converter;

    public static Expr Constant(ExactNumber value)
    {
        var rational = Expr.Number(new Rational(value.Numerator, value.Denominator));
        return value.PiPower == 0 ? rational : rational * Expr.Pow(Expr.Pi, new Rational(value.PiPower, 1));
    }

    public Expr Scalar(BoundExpr e)
    {
        switch (e)
        {
            case BoundNumber n:
                return Constant(n.Value);
            case BoundTime:
                return Symbol.Time;
            case BoundParamReference p:
                return KinematicModel.SymbolOf(p.Param);
            case BoundCoordReference c:
                return KinematicModel.SymbolOf(c.Coord, c.Marks);
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
            case BoundPower p:
                return Expr.Pow(Scalar(p.Base), new Rational(p.ExponentNumerator, p.ExponentDenominator));
            case BoundCall call:
                return Call(call);
            case BoundDot dot:
                {
                    var u = Vector(dot.Left);
                    var v = Vector(dot.Right);
                    var basis = CommonBasis(u, v);
                    return basis is null ? Expr.Zero : Vector3Expr.Dot(Converter.ToBasis(u, basis), Converter.ToBasis(v, basis));
                }

            default:
                throw new InvalidOperationException($"Not a scalar expression: {e.GetType().Name}.");
        }
    }

    public FrameVector Vector(BoundExpr e)
    {
        switch (e)
        {
            case BoundBracket b:
                return FrameVector.In(b.Basis, new Vector3Expr(Scalar(b.X), Scalar(b.Y), Scalar(b.Z)));
            case BoundUnitVector u:
                return FrameVector.In(u.Frame, Unit(u.Axis));
            case BoundUnary n:
                return Vector(n.Operand).Scaled(Expr.Number(-1));
            case BoundBinary b when b.Operator is BoundBinaryOperator.Add:
                return Vector(b.Left).Plus(Vector(b.Right));
            case BoundBinary b when b.Operator is BoundBinaryOperator.Subtract:
                return Vector(b.Left).Minus(Vector(b.Right));
            case BoundBinary b when b.Operator is BoundBinaryOperator.Multiply:
                return b.Left.IsVector ? Vector(b.Left).Scaled(Scalar(b.Right)) : Vector(b.Right).Scaled(Scalar(b.Left));
            case BoundBinary b when b.Operator is BoundBinaryOperator.Divide:
                return Vector(b.Left).Scaled(Expr.One / Scalar(b.Right));
            case BoundCross c:
                {
                    var u = Vector(c.Left);
                    var v = Vector(c.Right);
                    var basis = CommonBasis(v, u);
                    return basis is null ? FrameVector.Zero : FrameVector.In(basis, Vector3Expr.Cross(Converter.ToBasis(u, basis), Converter.ToBasis(v, basis)));
                }

            default:
                throw new InvalidOperationException($"Not a vector expression: {e.GetType().Name}.");
        }
    }

    /// <summary>Every frame whose basis or unit vectors an expression names.</summary>
    public static void CollectBases(BoundExpr e, ISet<FrameSymbol> bases)
    {
        var work = new Stack<BoundExpr>();
        work.Push(e);
        while (work.Count > 0)
        {
            switch (work.Pop())
            {
                case BoundBracket b:
                    bases.Add(b.Basis);
                    work.Push(b.X);
                    work.Push(b.Y);
                    work.Push(b.Z);
                    break;
                case BoundUnitVector u:
                    bases.Add(u.Frame);
                    break;
                case BoundUnary u:
                    work.Push(u.Operand);
                    break;
                case BoundBinary b:
                    work.Push(b.Left);
                    work.Push(b.Right);
                    break;
                case BoundPower p:
                    work.Push(p.Base);
                    break;
                case BoundCall c:
                    foreach (var a in c.Arguments)
                    {
                        work.Push(a);
                    }

                    break;
                case BoundCross c:
                    work.Push(c.Left);
                    work.Push(c.Right);
                    break;
                case BoundDot d:
                    work.Push(d.Left);
                    work.Push(d.Right);
                    break;
                case BoundLetReference l:
                    work.Push(l.Let.Definition);
                    break;
            }
        }
    }

    private BasisConverter Converter => _converter ?? throw new InvalidOperationException("The basis converter is not set.");

    /// <summary>The basis in which a product of two vectors is formed: the first part of <paramref name="preferred"/>, else of the other.</summary>
    private static FrameSymbol? CommonBasis(FrameVector preferred, FrameVector other) =>
        preferred.Parts.Select(p => p.Basis).FirstOrDefault() ?? other.Parts.Select(p => p.Basis).FirstOrDefault();

    private static Vector3Expr Unit(Axis axis) => axis switch
    {
        Axis.X => new(Expr.One, Expr.Zero, Expr.Zero),
        Axis.Y => new(Expr.Zero, Expr.One, Expr.Zero),
        _ => new(Expr.Zero, Expr.Zero, Expr.One),
    };

    private Expr Call(BoundCall call)
    {
        var a = Scalar(call.Arguments[0]);
        return call.Function switch
        {
            BoundFunction.Sin => Expr.Sin(a),
            BoundFunction.Cos => Expr.Cos(a),
            BoundFunction.Tan => Expr.Tan(a),
            BoundFunction.Asin => Expr.Asin(a),
            BoundFunction.Acos => Expr.Acos(a),
            BoundFunction.Atan => Expr.Atan(a),
            BoundFunction.Atan2 => Expr.Atan2(a, Scalar(call.Arguments[1])),
            BoundFunction.Sqrt => Expr.Sqrt(a),
            BoundFunction.Exp => Expr.Exp(a),
            _ => Expr.Ln(a),
        };
    }
}
