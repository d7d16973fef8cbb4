using System.Text;

namespace MotionSpec.Derivation.Tests.Support;

/// <summary>Pulls every formula out of a Markdown or LaTeX derivation, as a reader's math renderer would find them.</summary>
internal static class TexFormulas
{
    public sealed record Found(string Tex, bool Display, string Where);

    /// <summary><c>$$</c> blocks on their own lines and <c>$...$</c> inline, outside code spans and escapes.</summary>
    public static List<Found> FromMarkdown(string markdown)
    {
        var found = new List<Found>();
        var lines = markdown.Split('\n');
        for (var i = 0; i < lines.Length; i++)
        {
            if (lines[i] == "$$")
            {
                var body = new StringBuilder();
                var start = i + 1;
                for (i++; i < lines.Length && lines[i] != "$$"; i++)
                {
                    body.Append(lines[i]).Append('\n');
                }

                Assert.True(i < lines.Length, $"display math opened at line {start} is not closed");
                found.Add(new Found(body.ToString(), true, $"markdown line {start}"));
                continue;
            }

            Inline(lines[i], $"markdown line {i + 1}", found, markdown: true);
        }

        return found;
    }

    /// <summary><c>align*</c> blocks (whole, as KaTeX reads them in display mode) and <c>$...$</c> inline.</summary>
    public static List<Found> FromLatex(string latex)
    {
        var found = new List<Found>();
        var lines = latex.Split('\n');
        for (var i = 0; i < lines.Length; i++)
        {
            if (lines[i] == "\\begin{align*}")
            {
                var body = new StringBuilder(lines[i]).Append('\n');
                var start = i + 1;
                for (i++; i < lines.Length && lines[i] != "\\end{align*}"; i++)
                {
                    body.Append(lines[i]).Append('\n');
                }

                Assert.True(i < lines.Length, $"align* opened at line {start} is not closed");
                found.Add(new Found(body.Append(lines[i]).ToString(), true, $"latex line {start}"));
                continue;
            }

            Inline(lines[i], $"latex line {i + 1}", found, markdown: false);
        }

        return found;
    }

    private static void Inline(string line, string where, List<Found> found, bool markdown)
    {
        var inCode = false;
        var open = -1;
        for (var j = 0; j < line.Length; j++)
        {
            var c = line[j];
            if (c == '\\')
            {
                j++;
                continue;
            }

            if (markdown && c == '`' && open < 0)
            {
                inCode = !inCode;
                continue;
            }

            if (c == '$' && !inCode)
            {
                if (open < 0)
                {
                    open = j;
                }
                else
                {
                    found.Add(new Found(line[(open + 1)..j], false, where));
                    open = -1;
                }
            }
        }

        Assert.True(open < 0, $"unclosed $ at {where}");
    }
}
