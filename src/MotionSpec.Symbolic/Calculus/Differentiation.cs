namespace MotionSpec.Symbolic;

/// <summary>Time and partial derivatives by the chain rule, memoized over the DAG (linear in its size, no recursion).</summary>
public static class Differentiation
{
    /// <summary>d/dt: t gives 1, params 0, q gives q', q' gives q''; q'' or an intermediate fails with MissingDerivativeOf.</summary>
    public static DerivativeResult TimeDerivative(Expr e) => TimeDerivative(e, null);

    /// <summary>
    /// d/dt where intermediates have known derivatives: derivativeOf gives d/dt of an intermediate symbol, or null
    /// when it is unknown (then the result fails naming it).
    /// </summary>
    public static DerivativeResult TimeDerivative(Expr e, Func<Symbol, Expr?>? derivativeOf)
    {
        Symbol? missing = null;
        var result = Derive(e, s =>
        {
            switch (s.Kind)
            {
                case SymbolKind.Time:
                    return Nodes.One;
                case SymbolKind.Param:
                    return Nodes.Zero;
                case SymbolKind.Coord:
                    if (s.Order < 2)
                    {
                        return s.WithOrder(s.Order + 1);
                    }

                    break;
                default:
                    if (derivativeOf?.Invoke(s) is { } known)
                    {
                        return known;
                    }

                    break;
            }

            missing ??= s;
            return null;
        });
        return result is null ? DerivativeResult.Missing(missing!) : DerivativeResult.Success(result);
    }

    /// <summary>The partial derivative with respect to s; every other symbol is independent of s.</summary>
    public static Expr Partial(Expr e, Symbol s)
    {
        if (s is null)
        {
            throw new ArgumentNullException(nameof(s));
        }

        return Derive(e, x => ReferenceEquals(x, s) ? Nodes.One : Nodes.Zero)!;
    }

    /// <summary>The derivative given the derivatives of symbols; null as soon as one symbol has none.</summary>
    private static Expr? Derive(Expr e, Func<Symbol, Expr?> ofSymbol)
    {
        if (e is null)
        {
            throw new ArgumentNullException(nameof(e));
        }

        var d = new Dictionary<Expr, Expr>();
        foreach (var node in DagWalk.PostOrder(e))
        {
            Expr result;
            if (node.IsConstant)
            {
                result = Nodes.Zero;
            }
            else
            {
                switch (node)
                {
                    case Symbol s:
                        {
                            var ds = ofSymbol(s);
                            if (ds is null)
                            {
                                return null;
                            }

                            result = ds;
                            break;
                        }

                    case Sum sum:
                        {
                            var terms = new Expr[sum.Children.Length];
                            for (int i = 0; i < terms.Length; i++)
                            {
                                terms[i] = d[sum.Children[i]];
                            }

                            result = SumBuilder.Build(terms);
                            break;
                        }

                    case Product p:
                        result = ProductRule(p, d);
                        break;
                    case Power pw:
                        {
                            var du = d[pw.Base];
                            result = du.IsZero
                                ? Nodes.Zero
                                : ProductBuilder.Build([Expr.Number(pw.Exponent), PowerRules.Pow(pw.Base, pw.Exponent - Rational.One), du]);
                            break;
                        }

                    case Call c:
                        result = ChainRule(c, d);
                        break;
                    default:
                        result = Nodes.Zero;
                        break;
                }
            }

            d[node] = result;
        }

        return d[e];
    }

    private static Expr ProductRule(Product p, Dictionary<Expr, Expr> d)
    {
        var f = p.Children;
        var terms = new List<Expr>(f.Length);
        for (int i = 0; i < f.Length; i++)
        {
            var di = d[f[i]];
            if (di.IsZero)
            {
                continue;
            }

            var factors = new Expr[f.Length];
            for (int j = 0; j < f.Length; j++)
            {
                factors[j] = j == i ? di : f[j];
            }

            terms.Add(ProductBuilder.Build(factors));
        }

        return SumBuilder.Build(terms);
    }

#pragma warning disable CA1859 // the analyzer misreads the operator results; the rule returns general expressions
    private static Expr ChainRule(Call c, Dictionary<Expr, Expr> d)
    {
        var u = c.Children[0];
        if (c.Function == Function.Atan2)
        {
            // d atan2(y, x) = (x dy - y dx) / (x^2 + y^2)
            var x = c.Children[1];
            var dy = d[u];
            var dx = d[x];
            var numerator = (x * dy) - (u * dx);
            return numerator.IsZero ? Nodes.Zero : numerator / (Expr.Pow(x, 2) + Expr.Pow(u, 2));
        }

        var du = d[u];
        if (du.IsZero)
        {
            return Nodes.Zero;
        }

        Expr outer = c.Function switch
        {
            Function.Sin => Expr.Cos(u),
            Function.Cos => -Expr.Sin(u),
            Function.Tan => Expr.Pow(Expr.Cos(u), -2),
            Function.Asin => Expr.Pow(Nodes.One - Expr.Pow(u, 2), new Rational(-1, 2)),
            Function.Acos => -Expr.Pow(Nodes.One - Expr.Pow(u, 2), new Rational(-1, 2)),
            Function.Atan => Expr.Pow(Nodes.One + Expr.Pow(u, 2), -1),
            Function.Exp => c,
            Function.Ln => Expr.Pow(u, -1),
            _ => throw new InvalidOperationException("unreachable function"),
        };
        return outer * du;
    }
#pragma warning restore CA1859
}
