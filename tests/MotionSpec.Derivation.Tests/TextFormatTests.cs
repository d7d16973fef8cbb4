using System.Globalization;
using System.Text.RegularExpressions;
using MotionSpec.Compiler;
using MotionSpec.Derivation.Tests.Support;
using MotionSpec.Kinematics;
using MotionSpec.Symbolic;

namespace MotionSpec.Derivation.Tests;

/// <summary><c>derive --format text</c> as CLI.md pins it: line shapes, names, and lines that read back through our own parser.</summary>
public partial class TextFormatTests
{
    public static TheoryData<string> AllSpecs => [Specs.Turntable, Specs.SliderOnRod, Specs.RoverAttitude, Specs.Crane];

    [GeneratedRegex(@"^let (?<name>[A-Za-z_][A-Za-z0-9_]*) = (?<expr>.+)$")]
    private static partial Regex LetLine();

    [GeneratedRegex(@"^(?<report>[A-Za-z_][A-Za-z0-9_]*)\.(?<quantity>[A-Za-z]+) = \[(?<body>.+)\] in (?<basis>[A-Za-z_][A-Za-z0-9_]*)$")]
    private static partial Regex VectorLine();

    [Theory]
    [MemberData(nameof(AllSpecs))]
    public void Every_line_is_blank_a_comment_a_let_or_a_vector_and_every_vector_is_there(string spec)
    {
        var model = Specs.Model(spec);
        var text = Specs.Derived(spec, DerivationFormat.Text);
        Assert.EndsWith("\n", text, StringComparison.Ordinal);
        var vectors = new List<string>();
        foreach (var line in text.TrimEnd('\n').Split('\n'))
        {
            if (line.Length == 0 || line.StartsWith('#') || LetLine().IsMatch(line))
            {
                continue;
            }

            var match = VectorLine().Match(line);
            Assert.True(match.Success, "unexpected line: " + line);
            vectors.Add(match.Groups["report"].Value + "." + match.Groups["quantity"].Value + " in " + match.Groups["basis"].Value);
        }

        var expected = model.Reports.SelectMany(r => r.Quantities.Select(q => r.Name + "." + QuantityInfo.Key(q) + " in " + r.Report.Basis.Name));
        Assert.Equal(expected, vectors);
        Assert.Contains("# Caution: ", text, StringComparison.Ordinal);
    }

    [Theory]
    [MemberData(nameof(AllSpecs))]
    public void Lines_read_back_through_the_front_end_give_the_same_numbers(string spec)
    {
        var model = Specs.Model(spec);
        var text = Specs.Derived(spec, DerivationFormat.Text);

        // Each let stays a let; each vector component becomes `let __v<i> = E`, appended to the spec itself so
        // that params and coords are declared as the closed forms expect.
        var appended = new List<string>();
        var components = new List<Expr>();
        foreach (var line in text.Split('\n'))
        {
            if (LetLine().IsMatch(line))
            {
                appended.Add(line);
            }
            else if (VectorLine().Match(line) is { Success: true } match)
            {
                var report = model.Reports.Single(r => r.Name == match.Groups["report"].Value);
                var quantity = report.Quantities.Single(q => QuantityInfo.Key(q) == match.Groups["quantity"].Value);
                var parts = SplitTopLevel(match.Groups["body"].Value);
                Assert.Equal(3, parts.Count);
                for (var axis = 0; axis < 3; axis++)
                {
                    appended.Add($"let __v{components.Count} = {parts[axis]}");
                    components.Add(report[quantity][axis]);
                }
            }
        }

        var combined = spec + "\n" + string.Join("\n", appended) + "\n";
        var reread = SpecCompiler.Check("reread.motion", combined);
        Assert.False(reread.HasErrors, string.Join("\n", reread.Diagnostics.Select(d => $"{reread.Source!.GetLinePosition(d.Span.Start)} {d.Code} {d.Message} in: {combined.Split('\n')[reread.Source.GetLinePosition(d.Span.Start).Line - 1]}")));
        var lets = reread.Bound!.Lets.Where(l => l.Name.StartsWith("__v", StringComparison.Ordinal)).ToList();
        Assert.Equal(components.Count, lets.Count);

        foreach (var valueOf in RandomStates.Draw(model, 10, seed: 11))
        {
            for (var i = 0; i < components.Count; i++)
            {
                var engine = Evaluator.Evaluate(components[i], valueOf).Value;
                var readBack = BoundScalarEvaluator.Evaluate(lets[i].Definition, valueOf);
                Assert.True(Math.Abs(engine - readBack) <= 1e-9 * Math.Max(1, Math.Abs(engine)), string.Create(CultureInfo.InvariantCulture, $"{lets[i].Name}: {engine} vs {readBack}"));
            }
        }
    }

    [Fact]
    public void Intermediate_names_skip_every_name_the_spec_declares()
    {
        // The crane's closed forms need named intermediates; a param k1 and a coord k2 must push them to k3 on.
        var spec = Specs.Crane.Replace("param L = 18 m", "param L = 18 m\nparam k1 = 2\ncoord k2 : angle", StringComparison.Ordinal);
        var model = Specs.Model(spec);
        var text = DerivationWriter.Write(model, "x", DerivationFormat.Text);
        var lets = text.Split('\n').Where(l => l.StartsWith("let ", StringComparison.Ordinal)).Select(l => LetLine().Match(l).Groups["name"].Value).Where(n => !n.StartsWith("unit_", StringComparison.Ordinal)).ToList();
        Assert.NotEmpty(lets);
        Assert.DoesNotContain("k1", lets);
        Assert.DoesNotContain("k2", lets);
        Assert.Equal("k3", lets[0]);
        Assert.Equal(lets.Count, lets.Distinct(StringComparer.Ordinal).Count());
    }

    [Theory]
    [InlineData(DerivationFormat.Text)]
    [InlineData(DerivationFormat.Markdown)]
    [InlineData(DerivationFormat.Latex)]
    public void Same_spec_gives_the_same_bytes(DerivationFormat format)
    {
        // Two separate front-end runs, so that nothing is shared but the spec text.
        var first = DerivationWriter.Write(Specs.Check(Specs.Crane).Model!, "demo", format);
        var second = DerivationWriter.Write(Specs.Check(Specs.Crane).Model!, "demo", format);
        Assert.Equal(first, second);
        Assert.Equal(Specs.Derived(Specs.Crane, format), first);
    }

    [Fact]
    public void A_chosen_report_is_derived_alone_and_unknown_names_are_reported()
    {
        var model = Specs.Model(Specs.Crane);
        var text = DerivationWriter.Write(model, "demo", DerivationFormat.Text, ["tipOnTrolley"]);
        var vectors = text.Split('\n').Where(l => VectorLine().IsMatch(l)).ToList();
        Assert.Equal(8, vectors.Count);
        Assert.All(vectors, v => Assert.StartsWith("tipOnTrolley.", v, StringComparison.Ordinal));
        Assert.Equal(["tipInQuy", "nope"], DerivationWriter.UnknownReports(model, ["tipInQuay", "tipInQuy", "hookInQuay", "nope"]));
    }

    private static List<string> SplitTopLevel(string body)
    {
        var parts = new List<string>();
        var depth = 0;
        var start = 0;
        for (var i = 0; i < body.Length; i++)
        {
            switch (body[i])
            {
                case '(':
                    depth++;
                    break;
                case ')':
                    depth--;
                    break;
                case ',' when depth == 0:
                    parts.Add(body[start..i].Trim());
                    start = i + 1;
                    break;
            }
        }

        parts.Add(body[start..].Trim());
        return parts;
    }
}
