using System.Globalization;
using System.Text;
using MotionSpec.Compiler;
using MotionSpec.CSharp.Analysis;

namespace MotionSpec.CSharp.Tests;

/// <summary>The generated evaluator's size grows linearly with a serial chain's length, as a forward pass does.</summary>
public class GrowthTests
{
    [Fact]
    public void Operations_of_a_32_link_chain_are_at_most_2_2_times_those_of_16_links()
    {
        var sixteen = Operations(16);
        var thirtyTwo = Operations(32);

        Assert.True(thirtyTwo <= 2.2 * sixteen, $"16 links: {sixteen} operations, 32 links: {thirtyTwo}");
    }

    internal static int Operations(int links)
    {
        var code = CSharpEmitter.Emit(SpecCompiler.Check($"arm{links}.motion", Chain(links)), new CSharpEmitOptions()).Code!;
        var report = EmittedCodeCheck.Check(code);
        Assert.True(report.Passed, string.Join("\n", report.Findings));
        return report.Methods.Single().Operations;
    }

    // Links turning about z, y, z, ... each at the end of the last, a slider carrying the tip.
    internal static string Chain(int links)
    {
        var text = new StringBuilder("param a = 0.4 m\ncoord s : length\nframe base\n");
        for (var i = 1; i <= links; i++)
        {
            var parent = i == 1 ? "base" : "l" + (i - 1).ToString(CultureInfo.InvariantCulture);
            text.Append(CultureInfo.InvariantCulture, $"coord q{i} : angle\n");
            text.Append(CultureInfo.InvariantCulture, $"frame l{i} in {parent} {{ rotate about {(i % 2 == 1 ? 'z' : 'y')} by q{i}{(i == 1 ? "" : " origin at [a, 0, 0]")} }}\n");
        }

        text.Append(CultureInfo.InvariantCulture, $"point tip in l{links} at [a + s, 0, 0]\nreport tip in base\n");
        return text.ToString();
    }
}
