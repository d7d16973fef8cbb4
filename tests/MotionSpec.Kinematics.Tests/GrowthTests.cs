using System.Text;
using MotionSpec.Symbolic;
using static MotionSpec.Kinematics.Tests.SpecFixture;

namespace MotionSpec.Kinematics.Tests;

/// <summary>Expression size grows with the depth of the tree, not exponentially.</summary>
public class GrowthTests
{
    /// <summary>A chain of links turning about alternating axes, each offset along its parent's x.</summary>
    internal static string Chain(int links)
    {
        var text = new StringBuilder();
        for (var i = 1; i <= links; i++)
        {
            text.Append("coord q").Append(i).AppendLine(" : angle");
        }

        text.AppendLine("frame f0");
        for (var i = 1; i <= links; i++)
        {
            var axis = "xyz"[i % 3];
            text.Append("frame f").Append(i).Append(" in f").Append(i - 1).AppendLine(" {");
            text.Append("    rotate about ").Append(axis).Append(" by q").Append(i).AppendLine();
            text.AppendLine("    origin at [0.3 m, 0, 0]");
            text.AppendLine("}");
        }

        text.Append("point tip in f").Append(links).AppendLine(" at [0.1 m, 0, 0]");
        text.AppendLine("report tip in f0");
        return text.ToString();
    }

    private static int NodeCount(int links)
    {
        var report = Model(Chain(links)).Reports.Single();
        return ExprMetrics.NodeCount(report.Quantities.SelectMany(q => report[q].Components));
    }

    [Fact]
    public void Doubling_a_chain_at_most_doubles_the_shared_expression_size_plus_a_margin()
    {
        var sixteen = NodeCount(16);
        var thirtyTwo = NodeCount(32);
        Assert.True(thirtyTwo <= 2.2 * sixteen, $"16 links: {sixteen} nodes, 32 links: {thirtyTwo} nodes");
    }
}
