namespace MotionSpec.Symbolic;

/// <summary>
/// The canonical total order: by kind rank, then numbers by value, symbols by name, mark order and kind,
/// compound nodes by their children left to right. Iterative: it follows only the first differing child,
/// so it is linear in depth and never recurses.
/// </summary>
internal static class ExprOrder
{
    public static readonly IComparer<Expr> Comparer = Comparer<Expr>.Create(Compare);

    public static int Compare(Expr a, Expr b)
    {
        while (true)
        {
            if (ReferenceEquals(a, b))
            {
                return 0;
            }

            if (a.NodeKind != b.NodeKind)
            {
                return a.NodeKind.CompareTo(b.NodeKind);
            }

            switch (a)
            {
                case Number na:
                    return na.Value.CompareTo(((Number)b).Value);
                case Symbol sa:
                    {
                        var sb = (Symbol)b;
                        int c = string.CompareOrdinal(sa.Name, sb.Name);
                        if (c == 0)
                        {
                            c = sa.Order.CompareTo(sb.Order);
                        }

                        return c != 0 ? c : sa.Kind.CompareTo(sb.Kind);
                    }

                case Power pa:
                    {
                        var pb = (Power)b;
                        if (!ReferenceEquals(pa.Base, pb.Base))
                        {
                            a = pa.Base;
                            b = pb.Base;
                            continue;
                        }

                        return pa.Exponent.CompareTo(pb.Exponent);
                    }

                case Call ca:
                    {
                        var cb = (Call)b;
                        if (ca.Function != cb.Function)
                        {
                            return ca.Function.CompareTo(cb.Function);
                        }

                        break;
                    }
            }

            // Sums, products and calls: lexicographic over children; descend into the first difference.
            var xa = a.Children;
            var xb = b.Children;
            int n = Math.Min(xa.Length, xb.Length);
            int i = 0;
            while (i < n && ReferenceEquals(xa[i], xb[i]))
            {
                i++;
            }

            if (i == n)
            {
                return xa.Length.CompareTo(xb.Length);
            }

            a = xa[i];
            b = xb[i];
        }
    }
}
