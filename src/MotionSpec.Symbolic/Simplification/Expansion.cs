namespace MotionSpec.Symbolic;

/// <summary>Distributes products over sums inside the terms of a sum, within a term budget.</summary>
internal static class Expansion
{
    public const int MaxTerms = 64;

    /// <summary>The sum with every product-of-sums term multiplied out; null when nothing expands or the budget is exceeded.</summary>
    public static Expr? Expand(Sum s)
    {
        // Estimate the expanded size first: building products is the expensive part.
        long estimate = 0;
        bool any = false;
        foreach (var term in s.Children)
        {
            long count = 1;
            if (term is Product p)
            {
                foreach (var f in p.Children)
                {
                    if (f is Sum inner)
                    {
                        count *= inner.Children.Length;
                        any = true;
                    }
                    else if (f is Power { Base: Sum squared, Exponent: var e } && e == 2)
                    {
                        count *= (long)squared.Children.Length * squared.Children.Length;
                        any = true;
                    }

                    if (count > MaxTerms)
                    {
                        return null;
                    }
                }
            }

            estimate += count;
            if (estimate > MaxTerms)
            {
                return null;
            }
        }

        if (!any || !ExpansionPreview.CouldShrink(s, MaxTerms))
        {
            return null;
        }

        var terms = new List<Expr>();
        bool changed = false;
        foreach (var term in s.Children)
        {
            if (!ExpandTerm(term, terms, ref changed) || terms.Count > MaxTerms)
            {
                return null;
            }
        }

        return changed ? SumBuilder.Build(terms) : null;
    }

    private static bool ExpandTerm(Expr term, List<Expr> output, ref bool changed)
    {
        if (term is not Product p)
        {
            output.Add(term);
            return true;
        }

        var partial = new List<Expr> { Nodes.One };
        var plain = new List<Expr>();
        foreach (var f in p.Children)
        {
            IReadOnlyList<Expr>? alternatives = f switch
            {
                Sum inner => inner.Children,
                Power { Base: Sum inner, Exponent: var e } when e == 2 => Square(inner),
                _ => null,
            };
            if (alternatives is null)
            {
                plain.Add(f);
                continue;
            }

            changed = true;
            if ((long)partial.Count * alternatives.Count > MaxTerms)
            {
                return false;
            }

            var product = new List<Expr>(partial.Count * alternatives.Count);
            foreach (var a in partial)
            {
                foreach (var b in alternatives)
                {
                    product.Add(a * b);
                }
            }

            partial = product;
        }

        var rest = ProductBuilder.Build(plain);
        foreach (var a in partial)
        {
            output.Add(rest * a);
        }

        return true;
    }

    private static List<Expr> Square(Sum s)
    {
        var list = new List<Expr>();
        foreach (var a in s.Children)
        {
            foreach (var b in s.Children)
            {
                list.Add(a * b);
            }
        }

        return list;
    }
}
