using MotionSpec.Symbolic;

namespace MotionSpec.CSharp.Emission;

/// <summary>
/// Pulls common factors out of sums before common subexpressions are shared: in a sum of products the factor
/// found in most terms is taken out, <c>a*x + b*x + c</c> becoming <c>x*(a + b) + c</c>, and the two parts are
/// factored again. The closed forms of a chain arrive as long sums of products of a few sines, cosines and
/// rates, so this removes most of their multiplications. Ties go to the factor seen first, so the result is
/// deterministic. The value is unchanged up to floating-point rounding.
/// </summary>
internal sealed class GreedyFactoring
{
    private readonly Dictionary<Expr, Expr> _done = [];

    public IReadOnlyList<Expr> Apply(IReadOnlyList<Expr> outputs) => outputs.Select(Rewrite).ToList();

    private Expr Rewrite(Expr e)
    {
        if (_done.TryGetValue(e, out var known))
        {
            return known;
        }

        var result = e switch
        {
            Sum sum => FactorSum(sum.Terms.Select(Rewrite).ToList()),
            Product product => Expr.Product(product.Factors.Select(Rewrite)),
            Power power => Expr.Pow(Rewrite(power.Base), power.Exponent),
            Call call => Expr.Call(call.Function, call.Arguments.Select(Rewrite).ToArray()),
            _ => e,
        };
        _done[e] = result;
        return result;
    }

    private static Expr FactorSum(List<Expr> terms)
    {
        if (terms.Count < 2)
        {
            return Expr.Sum(terms);
        }

        // Count, for each non-numeric factor, the terms it appears in; remember the order first seen.
        var counts = new Dictionary<Expr, int>();
        var order = new List<Expr>();
        foreach (var term in terms)
        {
            foreach (var factor in FactorsOf(term).Distinct())
            {
                if (factor is Number)
                {
                    continue;
                }

                if (counts.TryGetValue(factor, out var n))
                {
                    counts[factor] = n + 1;
                }
                else
                {
                    counts[factor] = 1;
                    order.Add(factor);
                }
            }
        }

        Expr? best = null;
        var bestCount = 1;
        foreach (var factor in order)
        {
            if (counts[factor] > bestCount)
            {
                best = factor;
                bestCount = counts[factor];
            }
        }

        if (best is null)
        {
            return Expr.Sum(terms);
        }

        var with = new List<Expr>();
        var without = new List<Expr>();
        foreach (var term in terms)
        {
            var factors = FactorsOf(term);
            var index = IndexOf(factors, best);
            if (index < 0)
            {
                without.Add(term);
            }
            else
            {
                with.Add(Expr.Product(factors.Where((_, i) => i != index)));
            }
        }

        var factored = Expr.Product([best, FactorSum(with)]);
        return without.Count == 0 ? factored : Expr.Sum([factored, FactorSum(without)]);
    }

    private static IReadOnlyList<Expr> FactorsOf(Expr term) => term is Product product ? product.Factors : [term];

    private static int IndexOf(IReadOnlyList<Expr> factors, Expr wanted)
    {
        for (var i = 0; i < factors.Count; i++)
        {
            if (factors[i].Equals(wanted))
            {
                return i;
            }
        }

        return -1;
    }
}
