using MotionSpec.Symbolic;
using static MotionSpec.Kinematics.Tests.SpecFixture;

namespace MotionSpec.Kinematics.Tests;

/// <summary>Closed forms that cross a long chain keep the shared rotation entries instead of re-expanding them.</summary>
public class SharedRotationTests
{
    [Fact]
    public void The_relative_term_of_a_six_link_arm_is_the_slider_acceleration_times_an_entry_the_position_uses()
    {
        // A slider along the last link's x: the relative acceleration is s'' times that axis written in the
        // base, and the position contains s times the same axis (common practice, no source needed).
        var spec = GrowthTests.Chain(6).Replace("coord q1 : angle", "coord q1 : angle\ncoord s : length", StringComparison.Ordinal)
            .Replace("at [0.1 m, 0, 0]", "at [s, 0, 0]", StringComparison.Ordinal);
        var report = Model(spec).Reports.Single();
        var positionNodes = new HashSet<Expr>();
        var stack = new Stack<Expr>(report[Quantity.Position].Components);
        while (stack.Count > 0)
        {
            var node = stack.Pop();
            if (positionNodes.Add(node))
            {
                IEnumerable<Expr> children = node switch
                {
                    Sum sum => sum.Terms,
                    Product p => p.Factors,
                    Power power => [power.Base],
                    Call call => call.Arguments,
                    _ => [],
                };
                foreach (var child in children)
                {
                    stack.Push(child);
                }
            }
        }

        var sdd = Coord("s", 2);
        foreach (var component in report[Quantity.Relative].Components)
        {
            var product = Assert.IsType<Product>(component);
            Assert.Contains(sdd, product.Factors);
            var entry = product.Factors.Where(f => f is not Number && !f.Equals(sdd)).ToList();
            var single = Assert.Single(entry);
            Assert.True(positionNodes.Contains(single), $"the entry {single} is not shared with the position");
        }
    }
}
