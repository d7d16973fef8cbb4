using System.Text;

namespace MotionSpec.CSharp.Emission;

/// <summary>Writes indented lines with <c>\n</c> line ends, so that the same model gives the same bytes on any machine.</summary>
internal sealed class CodeWriter
{
    private readonly StringBuilder _text = new();
    private int _indent;

    public void Line(string line = "")
    {
        if (line.Length > 0)
        {
            _text.Append(' ', 4 * _indent).Append(line);
        }

        _text.Append('\n');
    }

    public void Open(string line)
    {
        Line(line);
        Line("{");
        _indent++;
    }

    public void Close(string suffix = "")
    {
        _indent--;
        Line("}" + suffix);
    }

    public void Summary(string xmlText) => Line("/// <summary>" + xmlText + "</summary>");

    public override string ToString() => _text.ToString();
}
