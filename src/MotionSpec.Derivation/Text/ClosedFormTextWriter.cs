using System.Text;
using MotionSpec.Derivation.Naming;
using MotionSpec.Kinematics;
using MotionSpec.Symbolic;

namespace MotionSpec.Derivation.Text;

/// <summary>
/// The plain closed forms: comment lines, <c>let kN = EXPR</c> intermediates, then one
/// <c>REPORT.QUANTITY = [E1, E2, E3] in BASIS</c> line per vector of every report, in the spec's own
/// expression syntax so that each line can be read back by the parser.
/// </summary>
internal static class ClosedFormTextWriter
{
    public static string Write(KinematicModel model, string displayName, NamedIntermediates named)
    {
        var text = new StringBuilder();
        Line(text, "# Closed forms of " + OneLine(displayName) + ", written by motionspec derive --format text.");
        Line(text, "# Every vector is in SI units and in the basis named at the end of its line; t is time in seconds.");
        foreach (var sentence in Wrap(SafetyCaution.Text, 100))
        {
            Line(text, "# " + sentence);
        }

        if (named.Temporaries.Count > 0)
        {
            Line(text, string.Empty);
            Line(text, "# Named intermediates used by the lines below.");
            foreach (var temporary in named.Temporaries)
            {
                Line(text, "let " + temporary.Name.Name + " = " + TextPrinter.Print(temporary.Value));
            }
        }

        var index = 0;
        foreach (var report in model.Reports)
        {
            Line(text, string.Empty);
            foreach (var quantity in report.Quantities)
            {
                var x = TextPrinter.Print(named.Outputs[index++]);
                var y = TextPrinter.Print(named.Outputs[index++]);
                var z = TextPrinter.Print(named.Outputs[index++]);
                Line(text, $"{report.Name}.{QuantityInfo.Key(quantity)} = [{x}, {y}, {z}] in {report.Report.Basis.Name}");
            }
        }

        return text.ToString();
    }

    /// <summary>Every component of every report vector, in the order the text and documents print them.</summary>
    public static IReadOnlyList<Expr> Outputs(KinematicModel model) =>
        model.Reports.SelectMany(r => r.Quantities.SelectMany(q => r[q].Components)).ToArray();

    private static void Line(StringBuilder text, string line) => text.Append(line).Append('\n');

    private static string OneLine(string s) => s.Replace('\r', ' ').Replace('\n', ' ');

    private static IEnumerable<string> Wrap(string paragraph, int width)
    {
        var line = new StringBuilder();
        foreach (var word in paragraph.Split(' '))
        {
            if (line.Length > 0 && line.Length + 1 + word.Length > width)
            {
                yield return line.ToString();
                line.Clear();
            }

            if (line.Length > 0)
            {
                line.Append(' ');
            }

            line.Append(word);
        }

        if (line.Length > 0)
        {
            yield return line.ToString();
        }
    }
}
