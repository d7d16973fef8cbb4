namespace MotionSpec.Language.Units;

/// <summary>
/// Character-level rules for where a unit ends: an atom, then while <c>*</c> or <c>/</c> is directly followed by
/// an atom, or <c>^</c> by an optional <c>-</c> and digits, the unit goes on. No spaces inside a unit.
/// </summary>
internal static class UnitText
{
    /// <summary>True for the characters that may start a name.</summary>
    public static bool IsNameStart(char c) => (c >= 'a' && c <= 'z') || (c >= 'A' && c <= 'Z') || c == '_';

    /// <summary>True for the characters that may continue a name.</summary>
    public static bool IsNamePart(char c) => IsNameStart(c) || (c >= '0' && c <= '9');

    /// <summary>True for an ASCII digit.</summary>
    public static bool IsDigit(char c) => c >= '0' && c <= '9';

    /// <summary>The length of the name starting at <paramref name="start"/> (0 when none starts there).</summary>
    public static int NameLength(string text, int start)
    {
        if (start >= text.Length || !IsNameStart(text[start]))
        {
            return 0;
        }

        var end = start + 1;
        while (end < text.Length && IsNamePart(text[end]))
        {
            end++;
        }

        return end - start;
    }

    /// <summary>
    /// The length of the unit starting at <paramref name="start"/>, whose first word (an atom or not) has
    /// already been seen there.
    /// </summary>
    public static int UnitLength(string text, int start)
    {
        var end = start + NameLength(text, start);
        end = ExponentEnd(text, end);
        while (end < text.Length && (text[end] == '*' || text[end] == '/'))
        {
            var word = NameLength(text, end + 1);
            if (word == 0 || UnitTable.Find(text.Substring(end + 1, word)) is null)
            {
                break;
            }

            end = ExponentEnd(text, end + 1 + word);
        }

        return end - start;
    }

    private static int ExponentEnd(string text, int at)
    {
        if (at >= text.Length || text[at] != '^')
        {
            return at;
        }

        var digits = at + 1;
        if (digits < text.Length && text[digits] == '-')
        {
            digits++;
        }

        if (digits >= text.Length || !IsDigit(text[digits]))
        {
            return at;
        }

        while (digits < text.Length && IsDigit(text[digits]))
        {
            digits++;
        }

        return digits;
    }
}
