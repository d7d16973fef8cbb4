namespace MotionSpec.Symbolic;

/// <summary>Builds canonical sums: flattened, like terms combined by coefficient, sorted, constants folded.</summary>
internal static class SumBuilder
{
    // Below this many distinct terms a linear scan beats a dictionary.
    private const int ScanLimit = 12;

    public static Expr Build(IEnumerable<Expr> terms)
    {
        var acc = new Accumulator();
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
                    acc.Add(inner);
                }
            }
            else
            {
                acc.Add(term);
            }
        }

        return acc.Finish();
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

    private struct Accumulator
    {
        private Rational _constant;
        private List<Expr>? _bodies;
        private List<Rational>? _coefficients;
        private Dictionary<Expr, int>? _index;

        public void Add(Expr term)
        {
            if (term is Number n)
            {
                _constant += n.Value;
                return;
            }

            var (c, body) = Split(term);
            _bodies ??= new List<Expr>(4);
            _coefficients ??= new List<Rational>(4);
            int at = Find(body);
            if (at >= 0)
            {
                _coefficients[at] += c;
                return;
            }

            _index?.Add(body, _bodies.Count);
            _bodies.Add(body);
            _coefficients.Add(c);
            if (_index is null && _bodies.Count > ScanLimit)
            {
                _index = new Dictionary<Expr, int>(_bodies.Count * 2);
                for (int i = 0; i < _bodies.Count; i++)
                {
                    _index.Add(_bodies[i], i);
                }
            }
        }

        private readonly int Find(Expr body)
        {
            if (_index is not null)
            {
                return _index.TryGetValue(body, out int at) ? at : -1;
            }

            var bodies = _bodies!;
            for (int i = 0; i < bodies.Count; i++)
            {
                if (ReferenceEquals(bodies[i], body))
                {
                    return i;
                }
            }

            return -1;
        }

        public readonly Expr Finish()
        {
            int count = 0;
            if (_bodies is not null)
            {
                foreach (var c in _coefficients!)
                {
                    if (!c.IsZero)
                    {
                        count++;
                    }
                }
            }

            if (count == 0)
            {
                return Number.Create(_constant);
            }

            var pairs = new (Expr Term, Rational Coefficient)[count];
            int k = 0;
            for (int i = 0; i < _bodies!.Count; i++)
            {
                if (!_coefficients![i].IsZero)
                {
                    pairs[k++] = (_bodies[i], _coefficients[i]);
                }
            }

            if (count == 1 && _constant.IsZero)
            {
                return ProductBuilder.Scale(pairs[0].Term, pairs[0].Coefficient);
            }

            if (count > 1)
            {
                Array.Sort(pairs, static (x, y) => ExprOrder.Compare(x.Term, y.Term));
            }

            var result = new Expr[count + (_constant.IsZero ? 0 : 1)];
            k = 0;
            if (!_constant.IsZero)
            {
                result[k++] = Number.Create(_constant);
            }

            foreach (var (body, c) in pairs)
            {
                result[k++] = ProductBuilder.Scale(body, c);
            }

            return Sum.CreateRaw(result);
        }
    }
}
