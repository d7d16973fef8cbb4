namespace MotionSpec.Symbolic;

/// <summary>
/// The hash-consing table: one live node per structure. Entries are weak so that a long-lived process
/// (an IDE hosting the source generator) does not keep every expression it ever built.
/// </summary>
internal static class InternTable
{
    private static readonly object Gate = new();
    private static readonly Dictionary<int, object> Buckets = [];
    private static int _entries;
    private static int _purgeAt = 1 << 16;

    public static T Intern<T>(T candidate)
        where T : Expr
    {
        lock (Gate)
        {
            int hash = candidate.Hash;
            if (Buckets.TryGetValue(hash, out var slot))
            {
                if (slot is WeakReference<Expr> single)
                {
                    if (single.TryGetTarget(out var existing) && existing.ShallowEquals(candidate))
                    {
                        return (T)existing;
                    }

                    Buckets[hash] = new List<WeakReference<Expr>> { single, new(candidate) };
                }
                else
                {
                    var list = (List<WeakReference<Expr>>)slot;
                    foreach (var weak in list)
                    {
                        if (weak.TryGetTarget(out var existing) && existing.ShallowEquals(candidate))
                        {
                            return (T)existing;
                        }
                    }

                    list.Add(new WeakReference<Expr>(candidate));
                }
            }
            else
            {
                Buckets[hash] = new WeakReference<Expr>(candidate);
            }

            if (++_entries >= _purgeAt)
            {
                Purge();
            }

            return candidate;
        }
    }

    private static void Purge()
    {
        var emptied = new List<int>();
        int live = 0;
        foreach (var pair in Buckets)
        {
            if (pair.Value is WeakReference<Expr> single)
            {
                if (single.TryGetTarget(out _))
                {
                    live++;
                }
                else
                {
                    emptied.Add(pair.Key);
                }
            }
            else
            {
                var list = (List<WeakReference<Expr>>)pair.Value;
                list.RemoveAll(w => !w.TryGetTarget(out _));
                live += list.Count;
                if (list.Count == 0)
                {
                    emptied.Add(pair.Key);
                }
            }
        }

        foreach (int key in emptied)
        {
            Buckets.Remove(key);
        }

        _entries = live;
        _purgeAt = Math.Max(1 << 16, live * 2);
    }
}
