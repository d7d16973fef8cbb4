using System.Globalization;
using System.Text;

namespace MotionSpec.CSharp.Tests;

/// <summary>Random frame trees as spec text: rotations about axes and skew directions, moving origins, sliders, reports with via and basis.</summary>
internal static class RandomSpecs
{
    private static readonly string[] Angles = ["q1", "q2 + w * t", "2 * q3", "sin(q1) - 0.4", "q2 * q3", "0.3", "w * t"];
    private static readonly string[] Axes = ["x", "y", "z", "[1, 2, -1]", "[0, 1, 1]"];
    private static readonly string[] Origins = ["[L, 0, 0]", "[s1, 0.2 m, 0]", "[0, L * cos(q1), s1]", "[0.1 m, -L, 0.05 m]"];
    private static readonly string[] Positions = ["[L, s1, 0.1 m]", "[0, 0, L]", "[s1 * s1 / L, 0, 0]", "[0.2 m, 0, s1]"];

    public const int CoordCount = 4;

    public static string Text(int seed)
    {
        var random = new Random(seed);
        var text = new StringBuilder();
        text.Append("param L = 0.7 m\nparam w = 12 rpm\nparam h = L / 3\n");
        text.Append("coord q1 : angle\ncoord q2 : angle\ncoord q3 : angle\ncoord s1 : length\n");
        text.Append("frame f0\n");
        var frames = 1 + random.Next(3, 7);
        for (var i = 1; i < frames; i++)
        {
            text.Append(CultureInfo.InvariantCulture, $"frame f{i} in f{random.Next(i)} {{");
            for (var r = random.Next(0, 3); r > 0; r--)
            {
                text.Append(CultureInfo.InvariantCulture, $" rotate about {Pick(random, Axes)} by {Pick(random, Angles)}");
            }

            if (random.Next(3) > 0)
            {
                text.Append(" origin at ").Append(Pick(random, Origins)).Append(i % 2 == 0 ? " + [0, 0, h]" : string.Empty);
            }

            text.Append(" }\n");
        }

        var points = random.Next(1, 4);
        for (var p = 0; p < points; p++)
        {
            text.Append(CultureInfo.InvariantCulture, $"point p{p} in f{random.Next(frames)} at {Pick(random, Positions)}\n");
        }

        for (var r = 0; r < 3; r++)
        {
            var subject = random.Next(4) == 0 ? $"f{random.Next(frames)}" : $"p{random.Next(points)}";
            var via = subject.StartsWith('p') && random.Next(2) == 0 ? $" via f{random.Next(frames)}" : string.Empty;
            var basis = random.Next(2) == 0 ? $" basis f{random.Next(frames)}" : string.Empty;
            text.Append(CultureInfo.InvariantCulture, $"report {subject} in f{random.Next(frames)}{via}{basis} as r{r}\n");
        }

        return text.ToString();
    }

    private static string Pick(Random random, string[] options) => options[random.Next(options.Length)];
}
