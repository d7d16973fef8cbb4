namespace MotionSpec.Symbolic;

/// <summary>Takes a symbolic factor out of the terms of a sum that share it: a*x + a*y + z = a*(x + y) + z.</summary>
internal static class CommonFactor
{
    /// <summary>Candidates: each base shared by two or more terms, taken out of those terms at its smallest power.</summary>
    public static IEnumerable<Expr> Candidates(Sum s)
    {
        var terms = s.Children;
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

        foreach (var b in order)
        {
            if (shared[b] < 2)
            {
                continue;
            }

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
