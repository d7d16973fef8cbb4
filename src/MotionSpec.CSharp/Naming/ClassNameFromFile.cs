using System.Text;

namespace MotionSpec.CSharp.Naming;

/// <summary>
/// The class name a spec gets when none is given: the runs of ASCII letters and digits in the file's name
/// (without its extension), each with its first letter upper-cased, joined; <c>_</c> in front when a digit
/// would lead, and <c>Spec</c> when the name has no letter or digit at all.
/// </summary>
public static class ClassNameFromFile
{
    /// <summary>For <c>harbour-crane.motion</c> gives <c>HarbourCrane</c>; for <c>2-link arm.motion</c>, <c>_2LinkArm</c>.</summary>
    public static string Derive(string path)
    {
        var fileName = BaseName(path ?? string.Empty);
        var builder = new StringBuilder();
        var runStart = true;
        foreach (var c in fileName)
        {
            if (IsAsciiLetterOrDigit(c))
            {
                builder.Append(runStart ? char.ToUpperInvariant(c) : c);
                runStart = false;
            }
            else
            {
                runStart = true;
            }
        }

        if (builder.Length == 0)
        {
            return "Spec";
        }

        return char.IsDigit(builder[0]) ? "_" + builder : builder.ToString();
    }

    private static string BaseName(string path)
    {
        var slash = Math.Max(path.LastIndexOf('/'), path.LastIndexOf('\\'));
        var name = slash >= 0 ? path.Substring(slash + 1) : path;
        var dot = name.LastIndexOf('.');
        return dot > 0 ? name.Substring(0, dot) : name;
    }

    private static bool IsAsciiLetterOrDigit(char c) =>
        (c >= 'a' && c <= 'z') || (c >= 'A' && c <= 'Z') || (c >= '0' && c <= '9');
}
