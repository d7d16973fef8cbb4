namespace MotionSpec.Symbolic;

/// <summary>Takes a symbolic factor out of the terms of a sum that share it: a*x + a*y + z = a*(x + y) + z.</summary>
internal static class CommonFactor
{
    private const int MaxCandidates = 3;

    /// <summary>
    /// Bases worth taking out. Taking g out of k terms adds a product and a sum node and removes one product
    /// node for each term that becomes a single factor (g*y becomes y), so only bases that make at least three
    /// terms collapse (two when every term has it) can shrink the sum.
    /// </summary>
    private static List<Expr> Promising(Expr[] terms)
    {
        var collapsing = new Dictionary<Expr, int>();
        var present = new Dictionary<Expr, int>();
        var order = new List<Expr>();
        foreach (var t in terms)
        {
            var factors = t is Product p ? p.Children : [t];
            int symbolic = 0;
            bool coefficient = false;
            foreach (var f in factors)
            {
                if (f is Number)
                {
                    coefficient = true;
                }
                else
                {
                    symbolic++;
                }
            }

            foreach (var f in factors)
            {
                if (f is Number)
                {
                    continue;
                }

                var b = f is Power pw ? pw.Base : f;
                if (!present.TryGetValue(b, out int seen))
                {
                    order.Add(b);
                }

                present[b] = seen + 1;
                if (!coefficient && symbolic <= 2)
                {
                    collapsing.TryGetValue(b, out int c);
                    collapsing[b] = c + 1;
                }
            }
        }

        var result = new List<Expr>();
        foreach (var b in order)
        {
            collapsing.TryGetValue(b, out int c);
            int needed = present[b] == terms.Length ? 2 : 3;
            if (present[b] >= 2 && c >= needed)
            {
                result.Add(b);
            }
        }

        return result;
    }

    /// <summary>Candidates: each promising base, taken out of those terms at its smallest power.</summary>
    public static IEnumerable<Expr> Candidates(Sum s)
    {
        var terms = s.Children;
        var promising = terms.Length < 2 ? [] : Promising(terms);
        if (promising.Count == 0)
        {
            yield break;
        }

        var factorMaps = new List<Dictionary<Expr, Rational>>(terms.Length);
        var shared = new Dictionary<Expr, int>();
        var order = new List<Expr>();
        foreach (var t in terms)
        {
            var map = new Dictionary<Expr, Rational>();
            IEnumerable<Expr> factors = t is Product p ? p.Children : [t];
            foreach (var f in factors)
            {
                if (f is Number)
                {
                    continue;
                }

                var (b, e) = f is Power pw ? (pw.Base, pw.Exponent) : (f, Rational.One);
                if (e.Sign <= 0 || !e.IsInteger)
                {
                    continue;
                }

                map[b] = e;
                if (shared.TryGetValue(b, out int count))
                {
                    shared[b] = count + 1;
                }
                else
                {
                    shared[b] = 1;
                    order.Add(b);
                }
            }

            factorMaps.Add(map);
        }

        var bases = promising.Take(MaxCandidates);
        foreach (var b in bases)
        {
            var lowest = Rational.Zero;
            foreach (var map in factorMaps)
            {
                if (map.TryGetValue(b, out var e) && (lowest.IsZero || e < lowest))
                {
                    lowest = e;
                }
            }

            var g = Expr.Pow(b, lowest);
            var inside = new List<Expr>();
            var outside = new List<Expr>();
            for (int i = 0; i < terms.Length; i++)
            {
                if (factorMaps[i].ContainsKey(b))
                {
                    inside.Add(terms[i] / g);
                }
                else
                {
                    outside.Add(terms[i]);
                }
            }

            outside.Add(g * SumBuilder.Build(inside));
            yield return SumBuilder.Build(outside);
        }
    }
}
