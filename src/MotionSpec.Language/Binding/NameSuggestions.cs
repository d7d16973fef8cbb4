using MotionSpec.Language.Binding.Symbols;

namespace MotionSpec.Language.Binding;

/// <summary>
/// Picks the declared name closest to a misspelt one: edit distance with insertions, deletions, substitutions
/// and swaps of two adjacent letters (each 1), at most 2 and less than the name's length; ties go to the name
/// declared first.
/// </summary>
public static class NameSuggestions
{
    /// <summary>The best candidate name, or null when none is close enough (used for command-line names too).</summary>
    public static string? Closest(string name, IEnumerable<string> candidatesInOrder)
    {
        string? best = null;
        var bestDistance = int.MaxValue;
        foreach (var candidate in candidatesInOrder)
        {
            if (Math.Abs(candidate.Length - name.Length) > 2)
            {
                continue;
            }

            var distance = Distance(name, candidate);
            if (distance <= 2 && distance < name.Length && distance < bestDistance)
            {
                best = candidate;
                bestDistance = distance;
            }
        }

        return best;
    }

    /// <summary>The best candidate, or null when none is close enough.</summary>
    public static Symbol? Closest(string name, IEnumerable<Symbol> candidatesInDeclarationOrder)
    {
        Symbol? best = null;
        var bestDistance = int.MaxValue;
        foreach (var candidate in candidatesInDeclarationOrder)
        {
            if (Math.Abs(candidate.Name.Length - name.Length) > 2)
            {
                continue;
            }

            var distance = Distance(name, candidate.Name);
            if (distance <= 2 && distance < name.Length && distance < bestDistance)
            {
                best = candidate;
                bestDistance = distance;
            }
        }

        return best;
    }

    /// <summary>Optimal string alignment distance (adjacent swaps count 1).</summary>
    public static int Distance(string a, string b)
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
                var value = Math.Min(Math.Min(d[i - 1, j] + 1, d[i, j - 1] + 1), d[i - 1, j - 1] + cost);
                if (i > 1 && j > 1 && a[i - 1] == b[j - 2] && a[i - 2] == b[j - 1])
                {
                    value = Math.Min(value, d[i - 2, j - 2] + 1);
                }

                d[i, j] = value;
            }
        }

        return d[a.Length, b.Length];
    }
}
