using MotionSpec.Kinematics;
using MotionSpec.Language.Binding.Expressions;
using Symbol = MotionSpec.Symbolic.Symbol;

namespace MotionSpec.Derivation.Tests.Support;

/// <summary>
/// Evaluates a bound scalar expression straight from the front end's tree, without the kinematics stage's
/// lowering, so that reading the text output back does not go through the code that produced it.
/// </summary>
internal static class BoundScalarEvaluator
{
    public static double Evaluate(BoundExpr e, Func<Symbol, double> valueOf) => e switch
    {
        BoundNumber n => n.Value.ToDouble(),
        BoundTime => valueOf(Symbol.Time),
        BoundParamReference p => valueOf(KinematicModel.SymbolOf(p.Param)),
        BoundCoordReference c => valueOf(KinematicModel.SymbolOf(c.Coord, c.Marks)),
        BoundLetReference l => Evaluate(l.Let.Definition, valueOf),
        BoundUnary u => -Evaluate(u.Operand, valueOf),
        BoundBinary b => b.Operator switch
        {
            BoundBinaryOperator.Add => Evaluate(b.Left, valueOf) + Evaluate(b.Right, valueOf),
            BoundBinaryOperator.Subtract => Evaluate(b.Left, valueOf) - Evaluate(b.Right, valueOf),
            BoundBinaryOperator.Multiply => Evaluate(b.Left, valueOf) * Evaluate(b.Right, valueOf),
            _ => Evaluate(b.Left, valueOf) / Evaluate(b.Right, valueOf),
        },
        BoundPower p => Math.Pow(Evaluate(p.Base, valueOf), (double)p.ExponentNumerator / (double)p.ExponentDenominator),
        BoundCall c => Call(c, valueOf),
        _ => throw new InvalidOperationException("not a scalar: " + e.GetType().Name),
    };

    private static double Call(BoundCall c, Func<Symbol, double> valueOf)
    {
        var x = Evaluate(c.Arguments[0], valueOf);
        return c.Function switch
        {
            BoundFunction.Sin => Math.Sin(x),
            BoundFunction.Cos => Math.Cos(x),
            BoundFunction.Tan => Math.Tan(x),
            BoundFunction.Asin => Math.Asin(x),
            BoundFunction.Acos => Math.Acos(x),
            BoundFunction.Atan => Math.Atan(x),
            BoundFunction.Atan2 => Math.Atan2(x, Evaluate(c.Arguments[1], valueOf)),
            BoundFunction.Sqrt => Math.Sqrt(x),
            BoundFunction.Exp => Math.Exp(x),
            _ => Math.Log(x),
        };
    }
}
