using System.Globalization;
using System.Text;
using MotionSpec.Compiler;
using MotionSpec.CSharp.Analysis;

namespace MotionSpec.CSharp.Tests;

/// <summary>
/// The generated evaluator of a serial chain grows linearly with the number of links, as a forward pass does
/// (the benchmarks hold 32 against 16 links; this test holds 16 against 8 to stay fast).
/// </summary>
public class GrowthTests
{
    [Fact]
    public void Doubling_a_chain_at_most_2_2_times_its_operations()
    {
        var eight = Operations(8);
        var sixteen = Operations(16);

        Assert.True(sixteen <= 2.2 * eight, $"8 links: {eight} operations, 16 links: {sixteen}");
        Assert.True(sixteen > eight);
    }

    private static int Operations(int links)
    {
        var code = CSharpEmitter.Emit(SpecCompiler.Check($"arm{links}.motion", Chain(links)), new CSharpEmitOptions()).Code!;
        var report = EmittedCodeCheck.Check(code);
        Assert.True(report.Passed, string.Join("\n", report.Findings));
        return report.Methods.Single().Operations;
    }

    // Links turning about z, y, z, ... each at the end of the last, a slider carrying the tip.
    private static string Chain(int links)
    {
        var text = new StringBuilder("param a = 0.4 m\ncoord s : length\nframe base\n");
        for (var i = 1; i <= links; i++)
        {
            var parent = i == 1 ? "base" : "l" + (i - 1).ToString(CultureInfo.InvariantCulture);
            var origin = i == 1 ? string.Empty : " origin at [a, 0, 0]";
            text.Append(CultureInfo.InvariantCulture, $"coord q{i} : angle\n");
            text.Append(CultureInfo.InvariantCulture, $"frame l{i} in {parent} {{ rotate about {(i % 2 == 1 ? 'z' : 'y')} by q{i}{origin} }}\n");
        }

        text.Append(CultureInfo.InvariantCulture, $"point tip in l{links} at [a + s, 0, 0]\nreport tip in base\n");
        return text.ToString();
    }
}
