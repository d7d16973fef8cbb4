namespace MotionSpec.Symbolic;

/// <summary>
/// Canonical function calls: odd and even symmetry (sin(-x) = -sin(x), cos(-x) = cos(x)), exact values at
/// zero and at rational multiples of pi where they are exact, and ln(exp(x)) = x.
/// </summary>
internal static class FunctionRules
{
    public static Expr Apply(Function f, Expr x)
    {
        if (x is null)
        {
            throw new ArgumentNullException(nameof(x));
        }

        switch (f)
        {
            case Function.Sin:
            case Function.Tan:
            case Function.Asin:
            case Function.Atan:
                if (IsNegative(x))
                {
                    return -Apply(f, -x);
                }

                break;
            case Function.Cos:
                if (IsNegative(x))
                {
                    return Apply(f, -x);
                }

                break;
            case Function.Sqrt:
                return PowerRules.Pow(x, Rational.Half);
            case Function.Atan2:
                throw new ArgumentException("atan2 takes two arguments.", nameof(f));
        }

        var exact = ExactValue(f, x);
        return exact ?? Call.CreateRaw(f, [x]);
    }

    public static Expr Atan2(Expr y, Expr x)
    {
        if (y is null)
        {
            throw new ArgumentNullException(nameof(y));
        }

        if (x is null)
        {
            throw new ArgumentNullException(nameof(x));
        }

        if (y is Number ny && x is Number nx)
        {
            int sy = ny.Value.Sign;
            int sx = nx.Value.Sign;
            if (sy == 0 && sx > 0)
            {
                return Nodes.Zero;
            }

            if (sy == 0 && sx < 0)
            {
                return Nodes.Pi;
            }

            if (sx == 0 && sy != 0)
            {
                return Expr.Number(new Rational(sy, 2)) * Nodes.Pi;
            }

            if (sx != 0 && ny.Value.Abs() == nx.Value.Abs())
            {
                var quarter = sx > 0 ? new Rational(sy, 4) : new Rational(3 * sy, 4);
                return Expr.Number(quarter) * Nodes.Pi;
            }
        }

        return Call.CreateRaw(Function.Atan2, [y, x]);
    }

    /// <summary>The canonical sign test: a negative number, a negative coefficient, or a sum whose leading non-constant term is negative.</summary>
    public static bool IsNegative(Expr x) => x switch
    {
        Number n => n.Value.Sign < 0,
        Product p => p.Coefficient.Sign < 0,
        Sum s => SumContent.LeadsNegative(s),
        _ => false,
    };

    private static Expr? ExactValue(Function f, Expr x)
    {
        switch (f)
        {
            case Function.Sin:
            case Function.Cos:
            case Function.Tan:
                {
                    if (x.IsZero)
                    {
                        return f == Function.Cos ? Nodes.One : Nodes.Zero;
                    }

                    if (!TryPiMultiple(x, out var k))
                    {
                        return null;
                    }

                    // k*pi in units of 15 degrees; only multiples of 30 and 45 degrees have simple exact values.
                    var twelfths = k * 12;
                    if (!twelfths.IsInteger)
                    {
                        return null;
                    }

                    int m = (int)(((twelfths.Numerator % 24) + 24) % 24);
                    if (m % 2 != 0 && m % 3 != 0)
                    {
                        return null;
                    }

                    var sin = SinOfFifteenDegrees(m);
                    var cos = SinOfFifteenDegrees((m + 6) % 24);
                    return f switch
                    {
                        Function.Sin => sin,
                        Function.Cos => cos,
                        _ => cos.IsZero ? null : sin / cos,
                    };
                }

            case Function.Asin:
                return x.TryGetRational(out var a) ? AsinValue(a) : null;
            case Function.Acos:
                {
                    if (!x.TryGetRational(out var c))
                    {
                        return null;
                    }

                    var asin = AsinValue(c);
                    return asin is null ? null : (Expr.Number(Rational.Half) * Nodes.Pi) - asin;
                }

            case Function.Atan:
                if (x.IsZero)
                {
                    return Nodes.Zero;
                }

                return x.IsOne ? Expr.Number(new Rational(1, 4)) * Nodes.Pi : null;
            case Function.Exp:
                return x.IsZero ? Nodes.One : null;
            case Function.Ln:
                if (x.IsOne)
                {
                    return Nodes.Zero;
                }

                return x is Call { Function: Function.Exp } e ? e.Children[0] : null;
            default:
                return null;
        }
    }

#pragma warning disable CA1859 // the analyzer misreads the operator results; these are general expressions
    private static Expr? AsinValue(Rational v)
    {
        if (v.IsZero)
        {
            return Nodes.Zero;
        }

        if (v == Rational.Half)
        {
            return Expr.Number(new Rational(1, 6)) * Nodes.Pi;
        }

        if (v.IsOne)
        {
            return Expr.Number(Rational.Half) * Nodes.Pi;
        }

        return null;
    }

#pragma warning restore CA1859

    /// <summary>sin(m * 15 degrees) for m a multiple of 2 or 3, m in 0..23.</summary>
    private static Expr SinOfFifteenDegrees(int m)
    {
        int sign = m < 12 ? 1 : -1;
        int r = m % 12;
        if (r > 6)
        {
            r = 12 - r;
        }

        Expr magnitude = r switch
        {
            0 => Nodes.Zero,
            2 => Nodes.Half,
            3 => Expr.Number(Rational.Half) * Expr.Pow(Nodes.Two, Rational.Half),
            4 => Expr.Number(Rational.Half) * Expr.Pow(Expr.Number(3), Rational.Half),
            6 => Nodes.One,
            _ => throw new InvalidOperationException("unreachable angle"),
        };
        return sign > 0 ? magnitude : -magnitude;
    }

    private static bool TryPiMultiple(Expr x, out Rational k)
    {
        if (x is PiConstant)
        {
            k = Rational.One;
            return true;
        }

        if (x is Product p && p.Children.Length == 2 && p.Children[0] is Number n && p.Children[1] is PiConstant)
        {
            k = n.Value;
            return true;
        }

        k = Rational.Zero;
        return false;
    }
}
