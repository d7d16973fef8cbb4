namespace MotionSpec.Symbolic;

/// <summary>
/// Predicts, without building any node, whether multiplying out a sum could shrink it: a product's body is
/// summarised by a commutative signature (the sum over its factors of exponent times a hash of the base), so
/// the signatures of expanded terms can be added, and equal signatures mean terms that would combine; the estimate of the
/// expanded size against the current one decides.
/// Pairs that differ by sin(u)^2 against cos(u)^2 (or by sin(u)^2 alone) mean the Pythagorean identity could
/// apply. A false positive only costs time; a false negative only skips one rewrite.
/// </summary>
internal static class ExpansionPreview
{
    public static bool CouldShrink(Sum s, int maxTerms)
    {
        var signatures = new List<ulong>();
        var fixedTerms = new HashSet<ulong>();
        int removed = 0;
        var trig = new List<(ulong Sin, ulong Cos)>();
        var sinSeen = new HashSet<Expr>();
        foreach (var term in s.Children)
        {
            var partial = new List<ulong> { 0 };
            ulong plain = 0;
            IEnumerable<Expr> factors = term is Product p ? p.Children : [term];
            foreach (var f in factors)
            {
                Note(f, trig, sinSeen);
                Expr[]? alternatives = f switch
                {
                    Sum inner => inner.Children,
                    _ => null,
                };
                if (f is Power { Base: Sum squared, Exponent: var e } && e == 2)
                {
                    var pairs = new List<ulong>();
                    foreach (var a in squared.Children)
                    {
                        foreach (var b in squared.Children)
                        {
                            pairs.Add(Signature(a) + Signature(b));
                        }
                    }

                    partial = Cross(partial, pairs);
                }
                else if (alternatives is not null)
                {
                    var options = new List<ulong>(alternatives.Length);
                    foreach (var a in alternatives)
                    {
                        options.Add(Signature(a));
                        IEnumerable<Expr> innerFactors = a is Product ip ? ip.Children : [a];
                        foreach (var g in innerFactors)
                        {
                            Note(g, trig, sinSeen);
                        }
                    }

                    partial = Cross(partial, options);
                }
                else
                {
                    plain += FactorSignature(f);
                }

                if (partial.Count > maxTerms)
                {
                    return false;
                }
            }

            if (partial.Count == 1 && partial[0] == 0)
            {
                // Nothing to multiply out: the term stays as it is.
                fixedTerms.Add(plain);
                continue;
            }

            removed += RemovedNodes(term);
            foreach (var x in partial)
            {
                signatures.Add(plain + x);
            }

            if (signatures.Count > maxTerms)
            {
                return false;
            }
        }

        // Compare estimated node counts: the product and sum nodes that expansion removes, against one new
        // product per distinct expanded term that neither combines with a term left as it is nor takes part
        // in a Pythagorean pair.
        var all = new HashSet<ulong>(fixedTerms);
        all.UnionWith(signatures);
        var fresh = new HashSet<ulong>();
        foreach (var x in signatures)
        {
            if (!fixedTerms.Contains(x))
            {
                fresh.Add(x);
            }
        }

        int pythagorean = 0;
        foreach (var x in fresh)
        {
            foreach (var (sin, cos) in trig)
            {
                ulong withoutSin = x - (2 * sin);
                ulong withoutCos = x - (2 * cos);
                if (all.Contains(withoutSin + (2 * cos)) || all.Contains(withoutSin) || all.Contains(withoutCos))
                {
                    pythagorean++;
                    break;
                }
            }
        }

        return fresh.Count - pythagorean < removed;
    }

    /// <summary>Nodes that disappear when a term is multiplied out: the term, its sum factors and their product terms.</summary>
    private static int RemovedNodes(Expr term)
    {
        int count = 1;
        if (term is Product p)
        {
            foreach (var f in p.Children)
            {
                var inner = f is Power { Base: Sum squared, Exponent: var e } && e == 2 ? squared : f as Sum;
                if (inner is null)
                {
                    continue;
                }

                count += f is Power ? 2 : 1;
                foreach (var t in inner.Children)
                {
                    if (t is Product)
                    {
                        count++;
                    }
                }
            }
        }

        return count;
    }

    private static void Note(Expr factor, List<(ulong Sin, ulong Cos)> trig, HashSet<Expr> seen)
    {
        var b = factor is Power pw ? pw.Base : factor;
        if (b is Call { Function: Function.Sin or Function.Cos } c && seen.Add(c.Children[0]))
        {
            var u = c.Children[0];
            trig.Add((Mix(Expr.Sin(u)), Mix(Expr.Cos(u))));
        }
    }

    private static List<ulong> Cross(List<ulong> left, List<ulong> right)
    {
        var result = new List<ulong>(left.Count * right.Count);
        foreach (var a in left)
        {
            foreach (var b in right)
            {
                result.Add(a + b);
            }
        }

        return result;
    }

    private static ulong Signature(Expr term)
    {
        if (term is Number)
        {
            return 0;
        }

        var (_, body) = SumBuilder.Split(term);
        if (body is not Product p)
        {
            return FactorSignature(body);
        }

        ulong sum = 0;
        foreach (var f in p.Children)
        {
            sum += FactorSignature(f);
        }

        return sum;
    }

    private static ulong FactorSignature(Expr f)
    {
        if (f is Number)
        {
            return 0;
        }

        if (f is Power pw && pw.Exponent.TryGetInt32(out int n))
        {
            return unchecked((ulong)n * Mix(pw.Base));
        }

        return Mix(f);
    }

    private static ulong Mix(Expr e)
    {
        unchecked
        {
            ulong h = (ulong)(uint)e.Hash * 0x9E3779B97F4A7C15UL;
            h ^= h >> 29;
            return (h * 0xBF58476D1CE4E5B9UL) | 1UL;
        }
    }
}
