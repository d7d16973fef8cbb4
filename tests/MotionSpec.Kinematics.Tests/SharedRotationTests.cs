using MotionSpec.Symbolic;
using static MotionSpec.Kinematics.Tests.SpecFixture;

namespace MotionSpec.Kinematics.Tests;

/// <summary>Closed forms that cross a long chain keep the shared rotation entries instead of re-expanding them.</summary>
public class SharedRotationTests
{
    [Fact]
    public void The_relative_term_of_a_six_link_arm_is_the_slider_acceleration_times_entries_the_position_uses()
    {
        // A slider along the last link's x: the relative acceleration is s'' times that axis written in the
        // base, and the position contains s times the same axis (common practice, no source needed).
        var spec = GrowthTests.Chain(6).Replace("coord q1 : angle", "coord q1 : angle\ncoord s : length", StringComparison.Ordinal)
            .Replace("at [0.1 m, 0, 0]", "at [s, 0, 0]", StringComparison.Ordinal);
        var report = Model(spec).Reports.Single();
        var position = report[Quantity.Position].Components;
        var relative = report[Quantity.Relative].Components;

        // Each component is one product of s'' and an entry; beyond the position's own nodes the three add
        // only s'', their products and a sign, where entries simplified on their own add dozens.
        foreach (var component in relative)
        {
            Assert.Contains(Coord("s", 2), Assert.IsType<Product>(component).Factors);
        }

        var added = ExprMetrics.NodeCount(position.Concat(relative)) - ExprMetrics.NodeCount(position);
        Assert.InRange(added, 4, 5);
    }
}
