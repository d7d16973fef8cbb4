namespace MotionSpec.Symbolic;

/// <summary>
/// The one definition of how a node evaluates in double arithmetic, shared by the Evaluator, the
/// EvaluationPlan and the C# printer so that all three give the same bits.
/// </summary>
internal static class DoubleSemantics
{
    public static double Pow(double x, Rational e)
    {
        if (e.TryGetInt32(out int n))
        {
            switch (n)
            {
                case 2: return x * x;
                case 3: return x * x * x;
                case 4: return (x * x) * (x * x);
                case -1: return 1.0 / x;
                case -2: return 1.0 / (x * x);
                case -3: return 1.0 / (x * x * x);
                case -4: return 1.0 / ((x * x) * (x * x));
            }
        }
        else if (e == Rational.Half)
        {
            return Math.Sqrt(x);
        }
        else if (e == new Rational(-1, 2))
        {
            return 1.0 / Math.Sqrt(x);
        }

        return Math.Pow(x, e.ToDouble());
    }

    public static double Apply(Function f, double x) => f switch
    {
        Function.Sin => Math.Sin(x),
        Function.Cos => Math.Cos(x),
        Function.Tan => Math.Tan(x),
        Function.Asin => Math.Asin(x),
        Function.Acos => Math.Acos(x),
        Function.Atan => Math.Atan(x),
        Function.Sqrt => Math.Sqrt(x),
        Function.Exp => Math.Exp(x),
        Function.Ln => Math.Log(x),
        _ => double.NaN,
    };

    public static bool IsFinite(double v) => !double.IsNaN(v) && !double.IsInfinity(v);
}
