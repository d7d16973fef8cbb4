using System.Globalization;
using System.Text;
using MotionSpec.Derivation.Tests.Support;

namespace MotionSpec.Derivation.Tests;

/// <summary>
/// A chain of links each inside the previous one: the relative position and velocity, built for the review
/// without named intermediates, double in printed size with every link. They are described instead of
/// printed once too long, so the document stays small and is written in seconds.
/// </summary>
public class LongChainTests
{
    private static string Chain(int links)
    {
        var text = new StringBuilder("param a = 0.25 m\ncoord q : angle\nframe link0\n");
        for (var i = 1; i <= links; i++)
        {
            text.Append(CultureInfo.InvariantCulture, $"frame link{i} in link{i - 1} {{ rotate about z by q origin at [a, 0, 0] }}\n");
        }

        return text.Append(CultureInfo.InvariantCulture, $"point tip in link{links} at [a, 0, 0]\nreport tip in link0 as tipInBase\n").ToString();
    }

    [Theory]
    [InlineData(DerivationFormat.Markdown)]
    [InlineData(DerivationFormat.Latex)]
    public void Twenty_links_describe_the_relative_motion_instead_of_printing_megabytes(DerivationFormat format)
    {
        // Printed in full, the relative position doubled per link: 35 kB for the whole document at 10 links,
        // 47 MB at 20 (measured before the kinematics composed long paths by matrices; it is still beyond the
        // print limit at 20 links).
        var document = DerivationWriter.Write(Specs.Model(Chain(20)), "chain", format);

        Assert.Contains("too long to print here", document, StringComparison.Ordinal);
        Assert.True(document.Length < 200_000, $"{document.Length} characters");
        Assert.Contains("tipInBase", document, StringComparison.Ordinal);
    }

    [Fact]
    public void Short_chain_still_prints_the_relative_motion()
    {
        var document = DerivationWriter.Write(Specs.Model(Chain(3)), "chain", DerivationFormat.Markdown);

        Assert.DoesNotContain("too long to print", document, StringComparison.Ordinal);
        Assert.Contains("\\left[\\mathbf{r}\\right]_{\\mathrm{link0}} &=", document, StringComparison.Ordinal);
    }
}
