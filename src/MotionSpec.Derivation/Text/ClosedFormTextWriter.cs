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
    public static string Write(KinematicModel model, IReadOnlyList<ReportMotion> reports, string displayName, NamedIntermediates named)
    {
        var text = new StringBuilder();
        Line(text, "# Closed forms of " + OneLine(displayName) + ", written by motionspec derive --format text.");
        Line(text, "# Every vector is in SI units and in the basis named at the end of its line; t is time in seconds.");
        foreach (var sentence in Wrap(SafetyCaution.Text, 100))
        {
            Line(text, "# " + sentence);
        }

        var dimensions = new TextDimensions(model.Spec, new SpecNames(model.Spec).IsTaken);
        var temporaries = new List<(string Name, Expr Value)>();
        foreach (var temporary in named.Temporaries)
        {
            var value = dimensions.Repair(temporary.Value, null);
            dimensions.Define(temporary.Name, value);
            temporaries.Add((temporary.Name.Name, value));
        }

        var vectors = new List<string>();
        var index = 0;
        foreach (var report in reports)
        {
            foreach (var quantity in report.Quantities)
            {
                var expected = QuantityInfo.DimensionOf(quantity);
                var parts = Enumerable.Range(0, 3).Select(_ => TextPrinter.Print(dimensions.Repair(named.Outputs[index++], expected))).ToArray();
                vectors.Add($"{report.Name}.{QuantityInfo.Key(quantity)} = [{parts[0]}, {parts[1]}, {parts[2]}] in {report.Report.Basis.Name}");
            }

            vectors.Add(string.Empty);
        }

        if (dimensions.UnitLets.Count > 0)
        {
            Line(text, string.Empty);
            Line(text, "# Units of value one: they multiply terms whose unit was folded into an SI number, so that every");
            Line(text, "# sum reads back with consistent dimensions. They change no value.");
            foreach (var (name, definition) in dimensions.UnitLets)
            {
                Line(text, "let " + name.Name + " = " + definition);
            }
        }

        if (temporaries.Count > 0)
        {
            Line(text, string.Empty);
            Line(text, "# Named intermediates used by the lines below.");
            foreach (var (name, value) in temporaries)
            {
                Line(text, "let " + name + " = " + TextPrinter.Print(value));
            }
        }

        Line(text, string.Empty);
        foreach (var vector in vectors.Take(vectors.Count - 1))
        {
            Line(text, vector);
        }

        return text.ToString();
    }

    /// <summary>Every component of every report vector, in the order the text and documents print them.</summary>
    public static IReadOnlyList<Expr> Outputs(IReadOnlyList<ReportMotion> reports) =>
        reports.SelectMany(r => r.Quantities.SelectMany(q => r[q].Components)).ToArray();

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
