using System.Numerics;
using MotionSpec.Language.Binding;

namespace MotionSpec.Language.Units;

/// <summary>The unit atoms of the language and their exact SI values.</summary>
internal static class UnitTable
{
    /// <summary>Every atom, in the order the language lists them.</summary>
    public static IReadOnlyList<UnitAtom> Atoms { get; } =
    [
        Atom("m", 1, 1, 0, Dimension.LengthDimension),
        Atom("cm", 1, 100, 0, Dimension.LengthDimension),
        Atom("mm", 1, 1000, 0, Dimension.LengthDimension),
        Atom("km", 1000, 1, 0, Dimension.LengthDimension),
        // The international inch and foot: 0.0254 m and 0.3048 m exactly.
        Atom("in", 127, 5000, 0, Dimension.LengthDimension),
        Atom("ft", 381, 1250, 0, Dimension.LengthDimension),
        Atom("rad", 1, 1, 0, Dimension.Dimensionless),
        Atom("deg", 1, 180, 1, Dimension.Dimensionless),
        Atom("rev", 2, 1, 1, Dimension.Dimensionless),
        Atom("s", 1, 1, 0, Dimension.TimeDimension),
        Atom("ms", 1, 1000, 0, Dimension.TimeDimension),
        Atom("min", 60, 1, 0, Dimension.TimeDimension),
        Atom("h", 3600, 1, 0, Dimension.TimeDimension),
        // One revolution per minute: 2 pi / 60 rad/s.
        Atom("rpm", 1, 30, 1, Dimension.Rate),
        // Standard gravity, 9.80665 m/s^2 by definition.
        Atom("g0", 196133, 20000, 0, Dimension.Of(1, -2)),
    ];

    private static readonly Dictionary<string, UnitAtom> ByName = Atoms.ToDictionary(a => a.Name, StringComparer.Ordinal);

    /// <summary>The atom of that name, or null.</summary>
    public static UnitAtom? Find(string name) => ByName.TryGetValue(name, out var atom) ? atom : null;

    /// <summary>The atoms' names separated by spaces, for messages.</summary>
    public static string Names => string.Join(" ", Atoms.Select(a => a.Name));

    private static UnitAtom Atom(string name, int numerator, int denominator, int piPower, Dimension dimension) =>
        new(name, new ExactNumber(new BigInteger(numerator), new BigInteger(denominator), piPower), dimension);
}
