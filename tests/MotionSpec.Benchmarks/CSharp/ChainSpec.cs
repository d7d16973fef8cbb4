using System.Globalization;
using System.Text;

namespace MotionSpec.Benchmarks.CSharp;

/// <summary>
/// A serial arm of N links as spec text: link 1 turns about z at the base, each further link sits a at the
/// end of the one before and turns about y, z, y... in turn; a slider s carries the tip along the last link.
/// </summary>
public static class ChainSpec
{
    public const double LinkLength = 0.4;

    public static string Text(int links)
    {
        var text = new StringBuilder();
        text.Append(CultureInfo.InvariantCulture, $"title \"Arm of {links} links turning about alternating axes\"\n");
        text.Append("param a = 0.4 m\n");
        for (var i = 1; i <= links; i++)
        {
            text.Append(CultureInfo.InvariantCulture, $"coord q{i} : angle\n");
        }

        text.Append("coord s : length\n");
        text.Append("frame base\n");
        for (var i = 1; i <= links; i++)
        {
            var parent = i == 1 ? "base" : "l" + (i - 1).ToString(CultureInfo.InvariantCulture);
            var origin = i == 1 ? string.Empty : " origin at [a, 0, 0]";
            text.Append(CultureInfo.InvariantCulture, $"frame l{i} in {parent} {{ rotate about {AxisOf(i)} by q{i}{origin} }}\n");
        }

        text.Append(CultureInfo.InvariantCulture, $"point tip in l{links} at [a + s, 0, 0]\n");
        text.Append("report tip in base\n");
        return text.ToString();
    }

    /// <summary>z for odd links (the first included), y for even ones.</summary>
    public static char AxisOf(int link) => link % 2 == 1 ? 'z' : 'y';
}
