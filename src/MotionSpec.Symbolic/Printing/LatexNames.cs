using System.Text;

namespace MotionSpec.Symbolic;

/// <summary>LaTeX for symbol names: Greek letters, subscripts from digits or an underscore, dots for marks.</summary>
internal static class LatexNames
{
    private static readonly Dictionary<string, string> Greek = new(StringComparer.Ordinal)
    {
        ["alpha"] = @"\alpha", ["beta"] = @"\beta", ["gamma"] = @"\gamma", ["delta"] = @"\delta",
        ["epsilon"] = @"\varepsilon", ["zeta"] = @"\zeta", ["eta"] = @"\eta", ["theta"] = @"\theta",
        ["iota"] = @"\iota", ["kappa"] = @"\kappa", ["lambda"] = @"\lambda", ["mu"] = @"\mu",
        ["nu"] = @"\nu", ["xi"] = @"\xi", ["rho"] = @"\rho", ["sigma"] = @"\sigma", ["tau"] = @"\tau",
        ["upsilon"] = @"\upsilon", ["phi"] = @"\varphi", ["chi"] = @"\chi", ["psi"] = @"\psi",
        ["omega"] = @"\omega", ["Gamma"] = @"\Gamma", ["Delta"] = @"\Delta", ["Theta"] = @"\Theta",
        ["Lambda"] = @"\Lambda", ["Xi"] = @"\Xi", ["Pi"] = @"\Pi", ["Sigma"] = @"\Sigma",
        ["Upsilon"] = @"\Upsilon", ["Phi"] = @"\Phi", ["Psi"] = @"\Psi", ["Omega"] = @"\Omega",
    };

    public static string Of(Symbol s)
    {
        var (stem, subscript) = Split(s.Name);
        string body = Word(stem);
        if (s.Order == 1)
        {
            body = @"\dot{" + body + "}";
        }
        else if (s.Order == 2)
        {
            body = @"\ddot{" + body + "}";
        }

        return subscript.Length == 0 ? body : body + "_{" + Word(subscript) + "}";
    }

    /// <summary>"theta1" is theta with subscript 1, "L_arm" is L with subscript arm.</summary>
    private static (string Stem, string Subscript) Split(string name)
    {
        int underscore = name.IndexOf('_');
        if (underscore > 0 && underscore < name.Length - 1)
        {
            return (name.Substring(0, underscore), name.Substring(underscore + 1));
        }

        int digits = name.Length;
        while (digits > 0 && char.IsDigit(name[digits - 1]))
        {
            digits--;
        }

        return digits > 0 && digits < name.Length ? (name.Substring(0, digits), name.Substring(digits)) : (name, string.Empty);
    }

    private static string Word(string w)
    {
        if (Greek.TryGetValue(w, out var letter))
        {
            return letter;
        }

        if (w.Length == 1 || IsDigits(w))
        {
            return w;
        }

        var sb = new StringBuilder(@"\mathrm{");
        foreach (char c in w)
        {
            sb.Append(c == '_' ? @"\_" : c.ToString());
        }

        return sb.Append('}').ToString();
    }

    private static bool IsDigits(string w)
    {
        foreach (char c in w)
        {
            if (!char.IsDigit(c))
            {
                return false;
            }
        }

        return true;
    }
}
