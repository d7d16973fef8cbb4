namespace MotionSpec.Symbolic;

/// <summary>
/// The one definition of how a node evaluates in double arithmetic, shared by the Evaluator, the
/// EvaluationPlan and the C# printer so that all three give the same bits.
/// </summary>
internal static class DoubleSemantics
{
    /// <summary>A power's exponent classified once, for the tape: small integers, square roots, or a general exponent.</summary>
    public static (int Code, double Exponent) Classify(Rational e)
    {
        if (e.TryGetInt32(out int n) && n is >= -4 and <= 4)
        {
            return (n, 0.0);
        }

        if (e == Rational.Half)
        {
            return (SquareRoot, 0.0);
        }

        if (e == new Rational(-1, 2))
        {
            return (InverseSquareRoot, 0.0);
        }

        return (General, e.ToDouble());
    }

    public const int SquareRoot = 10;
    public const int InverseSquareRoot = 11;
    public const int General = 12;

    /// <summary>The same values as Pow(x, e) for the exponent Classify(e) described.</summary>
    public static double Pow(double x, int code, double exponent) => code switch
    {
        2 => x * x,
        3 => x * x * x,
        4 => (x * x) * (x * x),
        -1 => 1.0 / x,
        -2 => 1.0 / (x * x),
        -3 => 1.0 / (x * x * x),
        -4 => 1.0 / ((x * x) * (x * x)),
        SquareRoot => Math.Sqrt(x),
        InverseSquareRoot => 1.0 / Math.Sqrt(x),
        _ => Math.Pow(x, exponent),
    };

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
