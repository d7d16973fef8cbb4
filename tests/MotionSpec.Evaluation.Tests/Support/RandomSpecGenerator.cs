using System.Globalization;
using System.Text;

namespace MotionSpec.Evaluation.Tests.Support;

/// <summary>
/// Writes random but legal .motion specs: a tree of frames turned about x, y, z and bracket axes by coords,
/// time and smooth functions of them, origins moved by coords, points fixed or on paths, and spin frames
/// hanging off the tree with only reports that stay in bases related to them.
/// </summary>
internal sealed class RandomSpecGenerator(int seed)
{
    private readonly Random _random = new(seed);
    private readonly StringBuilder _text = new();

    private static readonly string[] Axes = ["x", "y", "z", "[1, 2, -1]", "[0, 1, 1]", "[3, 0, -4]"];

    public string Generate()
    {
        _text.Clear();
        _text.AppendLine("title \"random tree\"");
        _text.AppendLine(Invariant($"param L1 = {Pick(0.2, 3):0.###} m"));
        _text.AppendLine(Invariant($"param L2 = {Pick(0.2, 3):0.###} m"));
        _text.AppendLine(Invariant($"param w1 = {Pick(-2, 2):0.###} rad/s"));
        _text.AppendLine("param L3 = L1 / 2 + L2");
        _text.AppendLine("coord q1 : angle");
        _text.AppendLine("coord q2 : angle");
        _text.AppendLine("coord q3 : angle");
        _text.AppendLine("coord s1 : length");
        _text.AppendLine("coord s2 : length");
        _text.AppendLine("let yaw = w1 * t + q1");

        // Ordinary frames: each with a random earlier parent, so depth varies.
        var ordinary = new List<string> { "f0" };
        var parentOf = new Dictionary<string, string>();
        _text.AppendLine("frame f0");
        var count = 2 + _random.Next(6);
        for (var i = 1; i <= count; i++)
        {
            var name = $"f{i}";
            var parent = ordinary[_random.Next(ordinary.Count)];
            parentOf[name] = parent;
            _text.Append(Invariant($"frame {name} in {parent} {{\n"));
            if (_random.Next(3) > 0)
            {
                _text.Append(Invariant($"    origin at [{Length()}, {Length()}, {Length()}]\n"));
            }

            var rotations = _random.Next(4);
            for (var k = 0; k < rotations; k++)
            {
                _text.Append(Invariant($"    rotate about {Axes[_random.Next(Axes.Length)]} by {Angle()}\n"));
            }

            _text.Append("}\n");
            ordinary.Add(name);
        }

        // Points on the ordinary tree.
        var points = new List<string>();
        for (var i = 0; i < 3; i++)
        {
            var name = $"p{i}";
            var frame = ordinary[_random.Next(ordinary.Count)];
            var at = _random.Next(3) == 0 && parentOf.TryGetValue(frame, out var up)
                ? Invariant($"[{Length()}, {Length()}, {Length()}] + s1 * {up}.x")
                : Invariant($"[{Length()}, {Length()}, {Length()}]");
            _text.Append(Invariant($"point {name} in {frame} at {at}\n"));
            points.Add(name);
        }

        // A spin frame (no origin, so its parent's vectors stay out of its reports), a turned child, points.
        var spinParent = ordinary[_random.Next(ordinary.Count)];
        _text.Append(Invariant($"frame imu in {spinParent} {{\n    spin [{Rate()}, {Rate()}, {Rate()}]\n}}\n"));
        _text.Append(Invariant($"frame pod in imu {{\n    origin at [{Length()}, 0, {Length()}]\n    rotate about {Axes[_random.Next(Axes.Length)]} by {Angle()}\n}}\n"));
        _text.Append(Invariant($"point lens in imu at [{Length()}, {Length()}, {Length()}]\n"));
        _text.Append(Invariant($"point tip in pod at [{Length()}, {Length()}, {Length()}]\n"));

        var n = 0;
        foreach (var point in points)
        {
            _text.Append(Invariant($"report {point} in {Any(ordinary)} via {Any(ordinary)} basis {Any(ordinary)} as r{n++}\n"));
        }

        _text.Append(Invariant($"report {Any(ordinary)} in {Any(ordinary)} basis {Any(ordinary)} as r{n++}\n"));
        _text.Append(Invariant($"report lens in {spinParent} via imu basis imu as r{n++}\n"));
        _text.Append(Invariant($"report lens in {spinParent} basis imu as r{n++}\n"));
        _text.Append(Invariant($"report tip in {spinParent} via pod basis pod as r{n++}\n"));
        _text.Append(Invariant($"report tip in imu basis pod as r{n++}\n"));
        _text.Append(Invariant($"report imu in {spinParent} basis imu as r{n++}\n"));
        _text.Append(Invariant($"report pod in {spinParent} basis pod as r{n++}\n"));
        return _text.ToString();
    }

    private string Any(List<string> names) => names[_random.Next(names.Count)];

    private double Pick(double low, double high) => low + ((high - low) * _random.NextDouble());

    private string Angle() => _random.Next(8) switch
    {
        0 => "q1",
        1 => "-q2",
        2 => "yaw",
        3 => Invariant($"q3 + {Pick(-1, 1):0.###}"),
        4 => "0.5 * sin(q2)",
        5 => Invariant($"w1 * t * {Pick(-1, 1):0.###}"),
        6 => "atan(q1) + q3 / 2",
        _ => Invariant($"{Pick(-3, 3):0.###}"),
    };

    private string Length() => _random.Next(7) switch
    {
        0 => "L1",
        1 => "s1",
        2 => Invariant($"{Pick(-2, 2):0.###} m"),
        3 => "L2 * cos(q1)",
        4 => "s2 + L3",
        5 => "0",
        _ => "L1 * sin(w1 * t)",
    };

    private string Rate() => _random.Next(5) switch
    {
        0 => "q1'",
        1 => "w1",
        2 => Invariant($"{Pick(-1, 1):0.###} rad/s"),
        3 => "q2' * cos(q3)",
        _ => "0.5 * w1 * sin(q1)",
    };

    private static string Invariant(FormattableString text) => text.ToString(CultureInfo.InvariantCulture);
}
