using MotionSpec.Language.Binding;

namespace MotionSpec.Derivation.Naming;

/// <summary>
/// Names a generated intermediate must not take: every name the spec declares, the language's reserved words
/// and function names, and the unit atoms (so that a line read back never means a unit or a spec name).
/// </summary>
internal sealed class SpecNames
{
    private static readonly string[] Reserved =
    [
        "title", "param", "coord", "let", "frame", "in", "at", "origin", "rotate", "about", "by", "spin", "point",
        "report", "via", "basis", "as", "t", "pi", "sin", "cos", "tan", "asin", "acos", "atan", "atan2", "sqrt",
        "exp", "ln", "cross", "dot", "x", "y", "z", "m", "cm", "mm", "km", "ft", "rad", "deg", "rev", "s", "ms",
        "min", "h", "rpm", "g0", "angle", "length",
    ];

    private readonly HashSet<string> _taken = new(StringComparer.Ordinal);

    public SpecNames(BoundSpec spec)
    {
        _taken.UnionWith(Reserved);
        _taken.UnionWith(spec.Parameters.Select(p => p.Name));
        _taken.UnionWith(spec.Coords.Select(c => c.Name));
        _taken.UnionWith(spec.Lets.Select(l => l.Name));
        _taken.UnionWith(spec.Frames.Select(f => f.Name));
        _taken.UnionWith(spec.Points.Select(p => p.Name));
        _taken.UnionWith(spec.Reports.Select(r => r.Name));
    }

    public bool IsTaken(string name) => _taken.Contains(name);
}
