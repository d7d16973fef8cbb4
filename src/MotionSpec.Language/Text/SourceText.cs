namespace MotionSpec.Language.Text;

/// <summary>
/// The decoded text of one spec file (byte-order mark removed) with its line map, so that any offset can be
/// turned into the line and column that editors show.
/// </summary>
public sealed class SourceText
{
    private readonly int[] _lineStarts;

    /// <summary>Wraps already-decoded text; <paramref name="path"/> is shown in diagnostics as given.</summary>
    public SourceText(string path, string content)
    {
        Path = path;
        Content = content.Length > 0 && content[0] == '\uFEFF' ? content.Substring(1) : content;
        _lineStarts = ComputeLineStarts(Content);
    }

    /// <summary>The file's path as the user gave it.</summary>
    public string Path { get; }

    /// <summary>The text, without a leading byte-order mark.</summary>
    public string Content { get; }

    /// <summary>Number of lines (a final line end starts one more, empty line).</summary>
    public int LineCount => _lineStarts.Length;

    /// <summary>The line and column of a character offset; columns count Unicode scalar values.</summary>
    public LinePosition GetLinePosition(int offset)
    {
        offset = Math.Max(0, Math.Min(offset, Content.Length));
        var line = Array.BinarySearch(_lineStarts, offset);
        if (line < 0)
        {
            line = ~line - 1;
        }

        var column = 1;
        for (var i = _lineStarts[line]; i < offset; i++)
        {
            // The low half of a surrogate pair belongs to the scalar value already counted.
            if (!(char.IsLowSurrogate(Content[i]) && i > 0 && char.IsHighSurrogate(Content[i - 1])))
            {
                column++;
            }
        }

        return new LinePosition(line + 1, column);
    }

    /// <summary>The text of a span.</summary>
    public string GetText(TextSpan span) => Content.Substring(span.Start, span.Length);

    private static int[] ComputeLineStarts(string text)
    {
        var starts = new List<int> { 0 };
        for (var i = 0; i < text.Length; i++)
        {
            var c = text[i];
            if (c == '\r')
            {
                if (i + 1 < text.Length && text[i + 1] == '\n')
                {
                    i++;
                }

                starts.Add(i + 1);
            }
            else if (c == '\n')
            {
                starts.Add(i + 1);
            }
        }

        return starts.ToArray();
    }
}
