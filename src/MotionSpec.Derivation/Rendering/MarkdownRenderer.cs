using System.Text;
using MotionSpec.Derivation.Document;

namespace MotionSpec.Derivation.Rendering;

/// <summary>
/// Markdown with TeX math as most renderers of engineering notes read it: <c>$...$</c> inline and
/// <c>$$</c> blocks on their own lines, with <c>aligned</c> rows inside.
/// </summary>
internal static class MarkdownRenderer
{
    public static string Render(DerivationDocument document)
    {
        var text = new StringBuilder();
        text.Append("# ").Append(Escape(document.Title)).Append("\n\n");
        foreach (var block in document.Blocks)
        {
            switch (block)
            {
                case Heading heading:
                    text.Append(new string('#', heading.Level + 1)).Append(' ').Append(Escape(heading.Text)).Append("\n\n");
                    break;
                case Paragraph paragraph:
                    text.Append(Runs(paragraph.Runs, inTable: false)).Append("\n\n");
                    break;
                case Equations equations:
                    text.Append("$$\n\\begin{aligned}\n");
                    text.Append(string.Join(" \\\\\n", equations.Rows)).Append('\n');
                    text.Append("\\end{aligned}\n$$\n\n");
                    break;
                case Table table:
                    text.Append("| ").Append(string.Join(" | ", table.Header.Select(c => Runs(c, inTable: true)))).Append(" |\n");
                    text.Append('|').Append(string.Concat(table.Header.Select(_ => " --- |"))).Append('\n');
                    foreach (var row in table.Rows)
                    {
                        text.Append("| ").Append(string.Join(" | ", row.Select(c => Runs(c, inTable: true)))).Append(" |\n");
                    }

                    text.Append('\n');
                    break;
                case Items items:
                    foreach (var entry in items.Entries)
                    {
                        text.Append("- ").Append(Runs(entry, inTable: false)).Append('\n');
                    }

                    text.Append('\n');
                    break;
            }
        }

        return text.ToString().TrimEnd('\n') + "\n";
    }

    private static string Runs(IReadOnlyList<Inline> runs, bool inTable)
    {
        var text = new StringBuilder();
        foreach (var run in runs)
        {
            switch (run)
            {
                case Words words:
                    text.Append(Escape(words.Text));
                    break;
                case Formula math:
                    text.Append('$').Append(math.Tex).Append('$');
                    break;
                case Code code:
                    text.Append(CodeSpan(code.Text, inTable));
                    break;
            }
        }

        return text.ToString();
    }

    // Backslash-escapes every character that Markdown (or its math extension) could read as markup.
    internal static string Escape(string s)
    {
        var text = new StringBuilder(s.Length);
        foreach (var c in s)
        {
            if (c is '\\' or '`' or '*' or '_' or '[' or ']' or '<' or '>' or '$' or '|' or '#' or '{' or '}')
            {
                text.Append('\\');
            }

            text.Append(c is '\r' or '\n' ? ' ' : c);
        }

        return text.ToString();
    }

    private static string CodeSpan(string code, bool inTable)
    {
        code = code.Replace("\r\n", " ", StringComparison.Ordinal).Replace('\r', ' ').Replace('\n', ' ');
        if (inTable)
        {
            code = code.Replace("|", "\\|", StringComparison.Ordinal);
        }

        var longest = 0;
        var run = 0;
        foreach (var c in code)
        {
            run = c == '`' ? run + 1 : 0;
            longest = Math.Max(longest, run);
        }

        var fence = new string('`', longest + 1);
        var pad = code.StartsWith('`') || code.EndsWith('`') ? " " : string.Empty;
        return fence + pad + code + pad + fence;
    }
}
