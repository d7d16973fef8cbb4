using System.Globalization;
using System.Text;

namespace MotionSpec.CSharp.Text;

/// <summary>
/// Makes text from outside (a title, a file name) safe inside a <c>//</c> comment: one line, no control or
/// format characters, no half of a surrogate pair. A line comment ends only at a line break, so once every
/// character C# treats as a line break is gone, no text can end the comment early (<c>*/</c> means nothing there).
/// </summary>
public static class CommentText
{
    /// <summary>The text on one line, every unsafe character replaced by a space.</summary>
    public static string OneLine(string? text)
    {
        if (string.IsNullOrEmpty(text))
        {
            return string.Empty;
        }

        var builder = new StringBuilder(text!.Length);
        for (var i = 0; i < text.Length; i++)
        {
            var c = text[i];
            if (char.IsHighSurrogate(c) && i + 1 < text.Length && char.IsLowSurrogate(text[i + 1]))
            {
                builder.Append(c).Append(text[i + 1]);
                i++;
                continue;
            }

            builder.Append(IsSafe(c) ? c : ' ');
        }

        return builder.ToString().Trim();
    }

    /// <summary>
    /// The text for an XML documentation comment: one line as above, with <c>&amp;</c>, <c>&lt;</c> and
    /// <c>&gt;</c> written as entities so that the documentation stays well-formed XML.
    /// </summary>
    public static string Xml(string? text) =>
        OneLine(text).Replace("&", "&amp;").Replace("<", "&lt;").Replace(">", "&gt;");

    private static bool IsSafe(char c)
    {
        switch (CharUnicodeInfo.GetUnicodeCategory(c))
        {
            case UnicodeCategory.Control:          // \r, \n, \u0085 and the other C0/C1 controls
            case UnicodeCategory.Format:           // bidirectional overrides and invisible characters
            case UnicodeCategory.LineSeparator:    // \u2028, a line break to C#
            case UnicodeCategory.ParagraphSeparator: // \u2029, likewise
            case UnicodeCategory.Surrogate:        // an unpaired half
            case UnicodeCategory.OtherNotAssigned:
                return false;
            default:
                return true;
        }
    }
}
