using System.Globalization;
using System.Text;
using MotionSpec.Derivation.Document;
using MotionSpec.Derivation.Naming;
using MotionSpec.Derivation.Tests.Support;
using MotionSpec.Symbolic;

namespace MotionSpec.Derivation.Tests;

/// <summary>
/// A long chain's closed forms are small as shared graphs but grow geometrically when written out as trees.
/// The document must stay bounded: recurring parts are named, and a cell too large to read says so.
/// </summary>
public class LongChainDocumentTests
{
    [Fact]
    public void A_sixteen_link_arm_gives_a_bounded_document_with_its_large_cells_marked()
    {
        var markdown = Specs.Derived(ArmText(16), DerivationFormat.Markdown);

        // Written out, the acceleration of this arm has tens of millions of nodes; the document stays small.
        Assert.True(markdown.Length < 2_000_000, $"{markdown.Length} characters");
        Assert.Contains("terms and factors written out; see derive --format text", markdown, StringComparison.Ordinal);
        Assert.Contains("## Caution", markdown, StringComparison.Ordinal);
    }

    [Fact]
    public void A_cell_at_the_limit_is_printed_and_one_above_is_marked()
    {
        // x1 + ... + xn has n + 1 nodes written out.
        static Expr SumOf(int n) => Expr.Sum(Enumerable.Range(1, n).Select(i => (Expr)Symbol.Coord("x" + i.ToString(CultureInfo.InvariantCulture))));

        Assert.DoesNotContain("written out", Tex.Cell(SumOf(Tex.CellNodeLimit - 1)), StringComparison.Ordinal);
        Assert.Contains("2,001 terms and factors written out", Tex.Cell(SumOf(Tex.CellNodeLimit)), StringComparison.Ordinal);
    }

    [Fact]
    public void A_temporary_used_twice_inside_one_closed_form_keeps_its_name()
    {
        // w is used by two different products of one output; it must stay named, not be written out twice.
        var a = Symbol.Coord("a");
        var b = Symbol.Coord("b");
        var c = Symbol.Coord("c");
        var w = (a * Expr.Cos(b)) + (c * Expr.Sin(b)) + (a * c);
        var output = (Expr.Cos(c) * w) + (Expr.Sin(a) * w * b);
        var named = NamedIntermediates.Find([output], new SpecNames(Specs.Model("frame base\n").Spec));

        var temporary = Assert.Single(named.Temporaries, t => t.Value.Equals(w));
        Assert.Contains(temporary.Name, Symbols(named.Outputs[0]));
    }

    private static IEnumerable<Expr> Symbols(Expr e) => e switch
    {
        Symbol => [e],
        Sum sum => sum.Terms.SelectMany(Symbols),
        Product product => product.Factors.SelectMany(Symbols),
        Power power => Symbols(power.Base),
        Call call => call.Arguments.SelectMany(Symbols),
        _ => [],
    };

    private static string ArmText(int links)
    {
        var text = new StringBuilder("param a = 0.4 m\ncoord s : length\n");
        for (var i = 1; i <= links; i++)
        {
            text.Append(CultureInfo.InvariantCulture, $"coord q{i} : angle\n");
        }

        text.Append("frame base\n");
        for (var i = 1; i <= links; i++)
        {
            var parent = i == 1 ? "base" : $"l{i - 1}";
            var origin = i == 1 ? string.Empty : " origin at [a, 0, 0]";
            text.Append(CultureInfo.InvariantCulture, $"frame l{i} in {parent} {{ rotate about {(i % 2 == 1 ? 'z' : 'y')} by q{i}{origin} }}\n");
        }

        text.Append(CultureInfo.InvariantCulture, $"point tip in l{links} at [a + s, 0, 0]\nreport tip in base\n");
        return text.ToString();
    }
}
