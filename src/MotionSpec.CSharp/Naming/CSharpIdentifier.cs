namespace MotionSpec.CSharp.Naming;

/// <summary>Checks and writes C# identifiers. Spec names are ASCII, so only ASCII names are accepted here.</summary>
public static class CSharpIdentifier
{
    /// <summary>True when <paramref name="name"/> is an ASCII letter or <c>_</c> followed by letters, digits or <c>_</c>.</summary>
    public static bool IsAsciiIdentifier(string? name)
    {
        if (string.IsNullOrEmpty(name) || !(IsAsciiLetter(name![0]) || name[0] == '_'))
        {
            return false;
        }

        foreach (var c in name)
        {
            if (!(IsAsciiLetter(c) || (c >= '0' && c <= '9') || c == '_'))
            {
                return false;
            }
        }

        return true;
    }

    /// <summary>True when the name needs (reserved word) or is better with (contextual word) a leading <c>@</c>.</summary>
    public static bool NeedsEscape(string name) => CSharpKeywords.IsReserved(name) || CSharpKeywords.IsContextual(name);

    /// <summary>True when the name is a reserved C# word (the ones a rename warning mentions).</summary>
    public static bool IsReservedWord(string name) => CSharpKeywords.IsReserved(name);

    /// <summary>The name as C# source: <c>class</c> becomes <c>@class</c>.</summary>
    public static string Escape(string name) => NeedsEscape(name) ? "@" + name : name;

    /// <summary>True for a dotted name of identifiers such as <c>Robot.Arm</c>.</summary>
    public static bool IsDottedName(string? name) =>
        !string.IsNullOrEmpty(name) && name!.Split('.').All(IsAsciiIdentifier);

    private static bool IsAsciiLetter(char c) => (c >= 'a' && c <= 'z') || (c >= 'A' && c <= 'Z');
}
