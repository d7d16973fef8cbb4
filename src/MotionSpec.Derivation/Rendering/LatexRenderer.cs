using System.Text;
using MotionSpec.Derivation.Document;

namespace MotionSpec.Derivation.Rendering;

/// <summary>
/// A standalone LaTeX document that any standard installation compiles: the article class with amsmath and
/// nothing else beyond the font encoding, so a reviewer can build it without fetching packages.
/// </summary>
internal static class LatexRenderer
{
    public static string Render(DerivationDocument document)
    {
        var text = new StringBuilder();
        text.Append("% Written by motionspec derive --format latex.\n");
        text.Append("\\documentclass[10pt]{article}\n");
        text.Append("\\usepackage[T1]{fontenc}\n");
        text.Append("\\usepackage{amsmath}\n");
        // Wide matrices of closed forms need more room than the default text width.
        text.Append("\\setlength{\\textwidth}{16cm}\n\\setlength{\\oddsidemargin}{0cm}\n\\setlength{\\evensidemargin}{0cm}\n");
        text.Append("\\allowdisplaybreaks\n");
        text.Append("\\setcounter{MaxMatrixCols}{12}\n");
        text.Append("\\title{").Append(Escape(document.Title)).Append("}\n\\date{}\n");
        text.Append("\\begin{document}\n\\maketitle\n\n");
        foreach (var block in document.Blocks)
        {
            switch (block)
            {
                case Heading heading:
                    var command = heading.Level switch { 1 => "section", 2 => "subsection", _ => "subsubsection" };
                    text.Append('\\').Append(command).Append('{').Append(Escape(heading.Text)).Append("}\n\n");
                    break;
                case Paragraph paragraph:
                    text.Append(Runs(paragraph.Runs)).Append("\n\n");
                    break;
                case Equations equations:
                    // align* rather than a displayed aligned block: its rows may break across pages.
                    text.Append("\\begin{align*}\n");
                    text.Append(string.Join(" \\\\\n", equations.Rows)).Append('\n');
                    text.Append("\\end{align*}\n\n");
                    break;
                case Table table:
                    // Paragraph columns sharing the text width, so long source text wraps instead of running off the page.
                    var column = $"p{{\\dimexpr\\textwidth/{table.Header.Count}-2\\tabcolsep\\relax}}";
                    text.Append("\\begin{center}\\small\n\\begin{tabular}{").Append(string.Concat(Enumerable.Repeat(column, table.Header.Count))).Append("}\n\\hline\n");
                    text.Append(string.Join(" & ", table.Header.Select(Runs))).Append(" \\\\\n\\hline\n");
                    foreach (var row in table.Rows)
                    {
                        text.Append(string.Join(" & ", row.Select(Runs))).Append(" \\\\\n");
                    }

                    text.Append("\\hline\n\\end{tabular}\n\\end{center}\n\n");
                    break;
                case Items items:
                    text.Append("\\begin{itemize}\n");
                    foreach (var entry in items.Entries)
                    {
                        text.Append("\\item ").Append(Runs(entry)).Append('\n');
                    }

                    text.Append("\\end{itemize}\n\n");
                    break;
            }
        }

        text.Append("\\end{document}\n");
        return text.ToString();
    }

    private static string Runs(IReadOnlyList<Inline> runs)
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
                    text.Append("\\texttt{").Append(Escape(code.Text)).Append('}');
                    break;
            }
        }

        return text.ToString();
    }

    // Text mode escapes for the special characters. Printable ASCII and the Latin-1 letters (which the T1
    // encoding has) pass; anything else becomes '?' so that the document compiles with the standard fonts
    // whatever the spec's title holds.
    internal static string Escape(string s)
    {
        var text = new StringBuilder(s.Length);
        foreach (var c in s)
        {
            text.Append(c switch
            {
                '\\' => "\\textbackslash{}",
                '{' => "\\{",
                '}' => "\\}",
                '$' => "\\$",
                '&' => "\\&",
                '#' => "\\#",
                '%' => "\\%",
                '_' => "\\_",
                '^' => "\\textasciicircum{}",
                '~' => "\\textasciitilde{}",
                '<' => "\\textless{}",
                '>' => "\\textgreater{}",
                '|' => "\\textbar{}",
                '"' => "\\textquotedbl{}",
                '\r' or '\n' or '\t' => " ",
                _ when c is >= '\u00C0' and <= '\u00FF' and not '\u00D7' and not '\u00F7' => c.ToString(),
                _ when c < ' ' || c > '~' => "?",
                _ => c.ToString(),
            });
        }

        return text.ToString();
    }
}
