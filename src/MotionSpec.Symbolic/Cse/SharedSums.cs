namespace MotionSpec.Symbolic;

/// <summary>
/// Sharing of partial sums. Canonical sums are flat, so a sum used inside a larger one hands over its terms and
/// is no longer a node of it: an angular velocity component added into the next link's terms is recomputed term
/// by term wherever it is used. Once such a sum has become a temporary, any later sum holding all of its terms
/// (or all of their negations) is rewritten to use the temporary instead, largest first.
/// </summary>
internal sealed class SharedSums
{
    private readonly List<(Symbol Name, Expr[] Terms)> _sums = [];
    private readonly Dictionary<Expr, List<(int Sum, bool Negated)>> _postings = [];

    /// <summary>Makes a temporary that holds a sum of at least two terms available to later sums.</summary>
    public void Register(Symbol name, Expr value)
    {
        if (value is not Sum sum || sum.Terms.Count < 2)
        {
            return;
        }

        var index = _sums.Count;
        _sums.Add((name, [.. sum.Terms]));
        foreach (var term in sum.Terms)
        {
            Post(term, index, negated: false);
            Post(-term, index, negated: true);
        }
    }

    /// <summary>The sum with every registered partial sum it wholly contains replaced by that temporary.</summary>
    public Expr Rewrite(Expr value)
    {
        if (value is not Sum sum || _sums.Count == 0)
        {
            return value;
        }

        var remaining = new HashSet<Expr>(sum.Terms);
        var used = new List<Expr>();
        while (remaining.Count >= 2 && Best(remaining) is { } best)
        {
            var (name, terms) = _sums[best.Sum];
            foreach (var term in terms)
            {
                remaining.Remove(best.Negated ? -term : term);
            }

            used.Add(best.Negated ? -name : name);
        }

        if (used.Count == 0)
        {
            return value;
        }

        // Keep the sum's own order for what is left, so the result does not depend on hash order.
        used.AddRange(sum.Terms.Where(remaining.Contains));
        return Expr.Sum(used);
    }

    private (int Sum, bool Negated)? Best(HashSet<Expr> terms)
    {
        var hits = new Dictionary<(int Sum, bool Negated), int>();
        foreach (var term in terms)
        {
            if (_postings.TryGetValue(term, out var list))
            {
                foreach (var posting in list)
                {
                    hits[posting] = hits.TryGetValue(posting, out var n) ? n + 1 : 1;
                }
            }
        }

        (int Sum, bool Negated)? best = null;
        var bestSize = 1;
        foreach (var pair in hits.OrderBy(p => p.Key.Sum).ThenBy(p => p.Key.Negated))
        {
            var size = _sums[pair.Key.Sum].Terms.Length;
            var whole = pair.Value == size;

            // A sum equal to a registered one is that node already, unless it is its negation.
            var proper = size < terms.Count || pair.Key.Negated;
            if (whole && proper && size > bestSize)
            {
                best = pair.Key;
                bestSize = size;
            }
        }

        return best;
    }

    private void Post(Expr term, int sum, bool negated)
    {
        if (!_postings.TryGetValue(term, out var list))
        {
            list = [];
            _postings[term] = list;
        }

        list.Add((sum, negated));
    }
}
