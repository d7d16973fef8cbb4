namespace MotionSpec.Symbolic;

/// <summary>
/// sin(u)^2 + cos(u)^2 = 1 in any scaled form inside a sum: a*R*sin(u)^2 + a*R*cos(u)^2 = a*R,
/// a*R - a*R*sin(u)^2 = a*R*cos(u)^2 (and the same with sin and cos swapped), and
/// a*R*sin(u)^2 + b*R*cos(u)^2 + c*R = (a-b)*R*sin(u)^2 + (b+c)*R.
/// </summary>
internal static class Pythagorean
{
    /// <summary>The sum with the identity applied until no pair is left; null when it never applies.</summary>
    public static Expr? Apply(Sum s)
    {
        if (!HasSquaredTrig(s))
        {
            return null;
        }

        Expr current = s;
        bool any = false;
        for (int round = 0; round < 64 && current is Sum sum; round++)
        {
            var next = Once(sum);
            if (next is null)
            {
                break;
            }

            any = true;
            current = next;
        }

        return any ? current : null;
    }

    private static bool HasSquaredTrig(Sum s)
    {
        foreach (var term in s.Children)
        {
            IEnumerable<Expr> factors = term is Product p ? p.Children : [term];
            foreach (var f in factors)
            {
                if (f is Power { Base: Call { Function: Function.Sin or Function.Cos } } pw && pw.Exponent.IsInteger && pw.Exponent >= 2)
                {
                    return true;
                }
            }
        }

        return false;
    }

    private static Expr? Once(Sum s)
    {
        var terms = s.Children;
        var bodyIndex = new Dictionary<Expr, int>();
        var coefficients = new Rational[terms.Length];
        var bodies = new Expr[terms.Length];
        for (int i = 0; i < terms.Length; i++)
        {
            if (terms[i] is Number n)
            {
                coefficients[i] = n.Value;
                bodies[i] = Nodes.One;
            }
            else
            {
                (coefficients[i], bodies[i]) = SumBuilder.Split(terms[i]);
            }

            bodyIndex[bodies[i]] = i;
        }

        for (int i = 0; i < terms.Length; i++)
        {
            foreach (var (trig, other) in SquaredTrig(bodies[i]))
            {
                var a = coefficients[i];
                // R: the body with this sin^2 (or cos^2) taken out.
                var r = bodies[i] * Expr.Pow(trig, -2);
                var partner = r * Expr.Pow(other, 2);
                bool hasPartner = bodyIndex.TryGetValue(partner, out int j) && j != i;
                bool hasRest = bodyIndex.TryGetValue(r, out int k) && k != i && (!hasPartner || k != j);
                if (hasPartner && coefficients[j] == a)
                {
                    return Replace(terms, [i, j], ProductBuilder.Scale(r, a));
                }

                if (hasRest && coefficients[k] == -a)
                {
                    return Replace(terms, [i, k], ProductBuilder.Scale(partner, -a));
                }

                if (hasPartner && hasRest)
                {
                    var b = coefficients[j];
                    var c = coefficients[k];
                    return Replace(terms, [i, j, k], ProductBuilder.Scale(bodies[i], a - b) + ProductBuilder.Scale(r, b + c));
                }
            }
        }

        return null;
    }

    /// <summary>Each sin(u) or cos(u) raised to an integer power of at least 2 in the body, with its partner function.</summary>
    private static IEnumerable<(Expr Trig, Expr Other)> SquaredTrig(Expr body)
    {
        IEnumerable<Expr> factors = body is Product p ? p.Children : [body];
        foreach (var f in factors)
        {
            if (f is Power { Base: Call { Function: Function.Sin or Function.Cos } c } pw && pw.Exponent.IsInteger && pw.Exponent >= 2)
            {
                var u = c.Children[0];
                var other = c.Function == Function.Sin ? Expr.Cos(u) : Expr.Sin(u);
                yield return (c, other);
            }
        }
    }

    private static Expr Replace(Expr[] terms, int[] drop, Expr added)
    {
        var list = new List<Expr>(terms.Length);
        for (int i = 0; i < terms.Length; i++)
        {
            if (Array.IndexOf(drop, i) < 0)
            {
                list.Add(terms[i]);
            }
        }

        list.Add(added);
        return SumBuilder.Build(list);
    }
}
