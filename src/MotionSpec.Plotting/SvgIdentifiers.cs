using System.Text;
using System.Text.RegularExpressions;

namespace MotionSpec.Plotting;

/// <summary>
/// Makes SVG output reproducible: the renderer numbers clip paths from a counter shared by the whole process,
/// so the same plot drawn twice gets different ids. Renumbering them in order of first appearance gives the
/// same bytes for the same plot.
/// </summary>
internal static partial class SvgIdentifiers
{
    [GeneratedRegex("id=\"([^\"]+)\"", RegexOptions.CultureInvariant, matchTimeoutMilliseconds: 10000)]
    private static partial Regex IdDeclaration();

    [GeneratedRegex("(id=\"|url\\(#|href=\"#)([^\")]+)", RegexOptions.CultureInvariant, matchTimeoutMilliseconds: 10000)]
    private static partial Regex IdUse();

    /// <summary>Renames every declared id to <c>ms1</c>, <c>ms2</c>... in document order, with its references.</summary>
    public static string Renumber(string svg)
    {
        var names = new Dictionary<string, string>(StringComparer.Ordinal);
        foreach (Match match in IdDeclaration().Matches(svg))
        {
            var id = match.Groups[1].Value;
            if (!names.ContainsKey(id))
            {
                names[id] = "ms" + (names.Count + 1).ToString(System.Globalization.CultureInfo.InvariantCulture);
            }
        }

        return IdUse().Replace(svg, m =>
            names.TryGetValue(m.Groups[2].Value, out var renamed)
                ? new StringBuilder(m.Groups[1].Value).Append(renamed).ToString()
                : m.Value);
    }
}
