namespace MotionSpec.Symbolic;

/// <summary>Builds canonical sums: flattened, like terms combined by coefficient, sorted, constants folded.</summary>
internal static class SumBuilder
{
    public static Expr Build(IEnumerable<Expr> terms)
    {
        var constant = Rational.Zero;
        var index = new Dictionary<Expr, int>();
        var rests = new List<Expr>();
        var coefficients = new List<Rational>();

        void Add(Expr term)
        {
            if (term is Number n)
            {
                constant += n.Value;
                return;
            }

            var (c, rest) = Split(term);
            if (index.TryGetValue(rest, out int at))
            {
                coefficients[at] += c;
            }
            else
            {
                index.Add(rest, rests.Count);
                rests.Add(rest);
                coefficients.Add(c);
            }
        }

        foreach (var term in terms)
        {
            if (term is null)
            {
                throw new ArgumentException("A sum term is null.", nameof(terms));
            }

            if (term is Sum s)
            {
                foreach (var inner in s.Children)
                {
                    Add(inner);
                }
            }
            else
            {
                Add(term);
            }
        }

        var pairs = new List<(Expr Term, Rational Coefficient)>(rests.Count);
        for (int i = 0; i < rests.Count; i++)
        {
            if (!coefficients[i].IsZero)
            {
                pairs.Add((rests[i], coefficients[i]));
            }
        }

        if (pairs.Count == 0)
        {
            return Number.Create(constant);
        }

        if (pairs.Count == 1 && constant.IsZero)
        {
            return ProductBuilder.Scale(pairs[0].Term, pairs[0].Coefficient);
        }

        pairs.Sort((x, y) => ExprOrder.Compare(x.Term, y.Term));
        var result = new Expr[pairs.Count + (constant.IsZero ? 0 : 1)];
        int k = 0;
        if (!constant.IsZero)
        {
            result[k++] = Number.Create(constant);
        }

        foreach (var (rest, c) in pairs)
        {
            result[k++] = ProductBuilder.Scale(rest, c);
        }

        return Sum.CreateRaw(result);
    }

    /// <summary>A non-numeric term as coefficient times the rest.</summary>
    public static (Rational Coefficient, Expr Body) Split(Expr term)
    {
        if (term is Product p && p.Children[0] is Number n)
        {
            return (n.Value, p.WithoutCoefficient());
        }

        return (Rational.One, term);
    }
}
