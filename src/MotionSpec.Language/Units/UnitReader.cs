using System.Globalization;
using MotionSpec.Language.Binding;

namespace MotionSpec.Language.Units;

/// <summary>The value of a unit's text (<c>m/s^2</c>): an exact SI factor and a dimension, or what is wrong.</summary>
internal static class UnitReader
{
    /// <summary>The result of reading a unit.</summary>
    internal readonly record struct Reading(ExactNumber Factor, Dimension Dimension, string? UnknownAtom, bool ExponentTooLarge, IReadOnlyList<string> Atoms);

    /// <summary>Reads unit text that <see cref="UnitText.UnitLength"/> delimited.</summary>
    public static Reading Read(string unit)
    {
        var factor = ExactNumber.One;
        var length = 0;
        var time = 0;
        var atoms = new List<string>();
        var position = 0;
        var divide = false;
        while (position < unit.Length)
        {
            var nameLength = UnitText.NameLength(unit, position);
            var name = unit.Substring(position, nameLength);
            position += nameLength;
            atoms.Add(name);
            var atom = UnitTable.Find(name);
            if (atom is null)
            {
                return new Reading(factor, Dimension.Free, name, false, atoms);
            }

            var exponent = 1;
            if (position < unit.Length && unit[position] == '^')
            {
                var end = position + 1;
                while (end < unit.Length && (UnitText.IsDigit(unit[end]) || (end == position + 1 && unit[end] == '-')))
                {
                    end++;
                }

                var digits = unit.Substring(position + 1, end - position - 1);
                position = end;
                if (digits.TrimStart('-').TrimStart('0').Length > 4
                    || !int.TryParse(digits, NumberStyles.AllowLeadingSign, CultureInfo.InvariantCulture, out exponent)
                    || Math.Abs(exponent) > Limits.Exponent)
                {
                    return new Reading(factor, Dimension.Free, null, true, atoms);
                }
            }

            if (divide)
            {
                exponent = -exponent;
            }

            factor = ExactNumber.Multiply(factor, atom.Factor.Pow(exponent));
            length += atom.Dimension.Length * exponent;
            time += atom.Dimension.Time * exponent;
            if (position < unit.Length)
            {
                divide = unit[position] == '/';
                position++;
            }
        }

        return new Reading(factor, Dimension.Of(length, time), null, false, atoms);
    }
}
