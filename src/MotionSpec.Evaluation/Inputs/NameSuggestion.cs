namespace MotionSpec.Evaluation.Inputs;

/// <summary>
/// The closest candidate to a mistyped name: edit distance with insertions, deletions, substitutions and
/// swaps of two adjacent letters (each 1), at most 2 and less than the name's length; ties go to the earlier.
/// </summary>
internal static class NameSuggestion
{
    public static string? Closest(string name, IEnumerable<string> candidates)
    {
        string? best = null;
        var bestDistance = int.MaxValue;
        foreach (var candidate in candidates)
        {
            var d = Distance(name, candidate);
            if (d <= 2 && d < name.Length && d < bestDistance)
            {
                best = candidate;
                bestDistance = d;
            }
        }

        return best;
    }

    internal static int Distance(string a, string b)
    {
        var d = new int[a.Length + 1, b.Length + 1];
        for (var i = 0; i <= a.Length; i++)
        {
            d[i, 0] = i;
        }

        for (var j = 0; j <= b.Length; j++)
        {
            d[0, j] = j;
        }

        for (var i = 1; i <= a.Length; i++)
        {
            for (var j = 1; j <= b.Length; j++)
            {
                var cost = a[i - 1] == b[j - 1] ? 0 : 1;
                d[i, j] = Math.Min(Math.Min(d[i - 1, j] + 1, d[i, j - 1] + 1), d[i - 1, j - 1] + cost);
                if (i > 1 && j > 1 && a[i - 1] == b[j - 2] && a[i - 2] == b[j - 1])
                {
                    d[i, j] = Math.Min(d[i, j], d[i - 2, j - 2] + 1);
                }
            }
        }

        return d[a.Length, b.Length];
    }
}
