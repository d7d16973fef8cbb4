namespace MotionSpec.Symbolic;

/// <summary>
/// Builds canonical products: flattened, numbers folded into one leading coefficient, like bases combined
/// by adding exponents, sorted by base. A sum factor gives up its content to the coefficient (SumContent),
/// so the same value never has two shapes; only a number times a lone sum is multiplied out, so that
/// 2*(a + b) and 2*a + 2*b are one node and terms cancel across sums.
/// </summary>
internal static class ProductBuilder
{
    // Below this many distinct bases a linear scan beats a dictionary.
    private const int ScanLimit = 12;

    public static Expr Build(IEnumerable<Expr> factors)
    {
        var coefficient = Rational.One;
        Dictionary<Expr, int>? index = null;
        var bases = new List<Expr>(4);
        var exponents = new List<Rational>(4);
        // The factor node a base arrived in while its exponent is unchanged, so settling can reuse it.
        var arrived = new List<Expr?>(4);

        foreach (var factor in factors)
        {
            if (factor is null)
            {
                throw new ArgumentException("A product factor is null.", nameof(factors));
            }

            if (factor is Product p)
            {
                // Factors of a canonical product are never products themselves.
                foreach (var inner in p.Children)
                {
                    if (!Take(inner))
                    {
                        return Nodes.Zero;
                    }
                }
            }
            else if (!Take(factor))
            {
                return Nodes.Zero;
            }
        }

        bool Take(Expr f)
        {
            switch (f)
            {
                case Number n:
                    if (n.Value.IsZero)
                    {
                        return false;
                    }

                    coefficient *= n.Value;
                    return true;
                case Power pw:
                    AddFactor(pw.Base, pw.Exponent, pw);
                    return true;
                case Sum sum:
                    {
                        var (content, primitive) = SumContent.Of(sum);
                        coefficient *= content;
                        AddFactor(primitive, Rational.One, primitive);
                        return true;
                    }

                default:
                    AddFactor(f, Rational.One, f);
                    return true;
            }
        }

        void AddFactor(Expr b, Rational e, Expr node)
        {
            int at = -1;
            if (index is not null)
            {
                if (!index.TryGetValue(b, out at))
                {
                    at = -1;
                }
            }
            else
            {
                for (int i = 0; i < bases.Count; i++)
                {
                    if (ReferenceEquals(bases[i], b))
                    {
                        at = i;
                        break;
                    }
                }
            }

            if (at >= 0)
            {
                exponents[at] += e;
                arrived[at] = null;
                return;
            }

            index?.Add(b, bases.Count);
            bases.Add(b);
            exponents.Add(e);
            arrived.Add(node);
            if (index is null && bases.Count > ScanLimit)
            {
                index = new Dictionary<Expr, int>(bases.Count * 2);
                for (int i = 0; i < bases.Count; i++)
                {
                    index.Add(bases[i], i);
                }
            }
        }

        // Combined exponents can fold (2^(1/2) * 2^(1/2) = 2) or unfold into products; settle them.
        var settled = new List<(Expr Base, Rational Exponent, Expr Factor)>(bases.Count);
        var extra = new List<Expr>();
        for (int i = 0; i < bases.Count; i++)
        {
            if (exponents[i].IsZero)
            {
                continue;
            }

            bool merged = exponents[i] != Rational.One && !(bases[i] is Number) && IsPlainCombination(bases[i])
                && !(bases[i] is Sum sb && exponents[i].IsInteger && !SumContent.Of(sb).Content.IsOne);
            var f = merged
                ? arrived[i] as Power ?? Power.CreateRaw(bases[i], exponents[i])
                : PowerRules.Pow(bases[i], exponents[i]);
            switch (f)
            {
                case Number n:
                    if (n.Value.IsZero)
                    {
                        return Nodes.Zero;
                    }

                    coefficient *= n.Value;
                    break;
                case Power pw when ReferenceEquals(pw.Base, bases[i]):
                    settled.Add((bases[i], pw.Exponent, pw));
                    break;
                case Power or Product:
                    extra.Add(f);
                    break;
                default:
                    // A sum reached through merged fractional powers may still hold its content: rebuild.
                    if (ReferenceEquals(f, bases[i]) && !(f is Sum fs && !SumContent.Of(fs).Content.IsOne))
                    {
                        settled.Add((bases[i], Rational.One, f));
                    }
                    else
                    {
                        extra.Add(f);
                    }

                    break;
            }
        }

        if (extra.Count > 0)
        {
            // Rare: a combined power unfolded (for example (x*y)^(1/2) squared); rebuild once.
            var all = new List<Expr>(settled.Count + extra.Count + 1) { Number.Create(coefficient) };
            foreach (var s in settled)
            {
                all.Add(s.Factor);
            }

            all.AddRange(extra);
            return Build(all);
        }

        if (coefficient.IsZero)
        {
            return Nodes.Zero;
        }

        if (settled.Count == 0)
        {
            return Number.Create(coefficient);
        }

        if (settled.Count == 1)
        {
            var only = settled[0].Factor;
            if (coefficient.IsOne)
            {
                return only;
            }

            if (only is Sum sum)
            {
                return Distribute(sum, coefficient);
            }
        }

        settled.Sort(static (x, y) =>
        {
            int c = ExprOrder.Compare(x.Base, y.Base);
            return c != 0 ? c : x.Exponent.CompareTo(y.Exponent);
        });

        var result = new Expr[settled.Count + (coefficient.IsOne ? 0 : 1)];
        int k = 0;
        if (!coefficient.IsOne)
        {
            result[k++] = Number.Create(coefficient);
        }

        foreach (var s in settled)
        {
            result[k++] = s.Factor;
        }

        return Product.CreateRaw(result);
    }

    /// <summary>A base whose powers need no further folding (symbols, calls, sums, pi).</summary>
    private static bool IsPlainCombination(Expr b) => b is Symbol or Call or Sum or PiConstant;

    /// <summary>c * e in canonical form, fast for the common cases.</summary>
    public static Expr Scale(Expr e, Rational c)
    {
        if (c.IsOne)
        {
            return e;
        }

        if (c.IsZero)
        {
            return Nodes.Zero;
        }

        switch (e)
        {
            case Number n:
                return Number.Create(n.Value * c);
            case Sum s:
                return Distribute(s, c);
            case Product p:
                {
                    var newCoefficient = p.Coefficient * c;
                    var rest = p.WithoutCoefficient();
                    if (newCoefficient.IsOne)
                    {
                        return rest;
                    }

                    if (rest is Product rp)
                    {
                        var factors = new Expr[rp.Children.Length + 1];
                        factors[0] = Number.Create(newCoefficient);
                        Array.Copy(rp.Children, 0, factors, 1, rp.Children.Length);
                        return Product.CreateRaw(factors);
                    }

                    return Product.CreateRaw([Number.Create(newCoefficient), rest]);
                }

            default:
                return Product.CreateRaw([Number.Create(c), e]);
        }
    }

    /// <summary>Every term of the sum scaled by c (non-zero).</summary>
    internal static Sum Distribute(Sum sum, Rational c)
    {
        var terms = new Expr[sum.Children.Length];
        for (int i = 0; i < terms.Length; i++)
        {
            terms[i] = Scale(sum.Children[i], c);
        }

        // Scaling every term by one non-zero number keeps them distinct and in order.
        return Sum.CreateRaw(terms);
    }
}
