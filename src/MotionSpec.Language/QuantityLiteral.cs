using MotionSpec.Language.Binding;
using MotionSpec.Language.Units;

namespace MotionSpec.Language;

/// <summary>
/// Reads a quantity given on the command line (<c>10 deg/s</c>, <c>-2e-05</c>, <c>+.5 m</c>, <c>100ms</c>) with
/// the language's own number and unit rules: an optional sign, a number, optional spaces, an optional unit.
/// </summary>
public static class QuantityLiteral
{
    /// <summary>
    /// Parses <paramref name="text"/>. On success the value is in SI, the dimension is the unit's (free when no
    /// unit is written) and <paramref name="error"/> is null; on failure <paramref name="error"/> says why.
    /// </summary>
    public static bool TryParse(string text, out double siValue, out Dimension dimension, out bool hasUnit, out string? error)
    {
        siValue = 0;
        dimension = Dimension.Free;
        hasUnit = false;
        error = null;
        var s = text.Trim();
        var position = 0;
        var negative = false;
        if (position < s.Length && (s[position] == '+' || s[position] == '-'))
        {
            negative = s[position] == '-';
            position++;
        }

        var numberStart = position;
        while (position < s.Length && UnitText.IsDigit(s[position]))
        {
            position++;
        }

        var integerDigits = position - numberStart;
        var fractionDigits = 0;
        if (position < s.Length && s[position] == '.')
        {
            position++;
            var fractionStart = position;
            while (position < s.Length && UnitText.IsDigit(s[position]))
            {
                position++;
            }

            fractionDigits = position - fractionStart;
            if (fractionDigits == 0)
            {
                error = integerDigits == 0 ? $"'{text}' is not a number" : $"'{text}': a decimal point needs a digit after it";
                return false;
            }
        }

        if (integerDigits + fractionDigits == 0)
        {
            error = $"'{text}' does not start with a number";
            return false;
        }

        if (position < s.Length && (s[position] == 'e' || s[position] == 'E'))
        {
            var digits = position + 1;
            if (digits < s.Length && (s[digits] == '+' || s[digits] == '-'))
            {
                digits++;
            }

            if (digits < s.Length && UnitText.IsDigit(s[digits]))
            {
                position = digits;
                while (position < s.Length && UnitText.IsDigit(s[position]))
                {
                    position++;
                }
            }
        }

        var numberText = s.Substring(numberStart, position - numberStart);
        if (numberText.Length > Limits.NumberLength || ExactNumber.ParseDecimal(numberText) is not { } value)
        {
            error = $"'{text}' is beyond the range of finite numbers";
            return false;
        }

        while (position < s.Length && (s[position] == ' ' || s[position] == '\t'))
        {
            position++;
        }

        if (position < s.Length)
        {
            if (UnitText.NameLength(s, position) == 0)
            {
                error = $"'{text}': unexpected '{s.Substring(position)}' after the number";
                return false;
            }

            var length = UnitText.UnitLength(s, position);
            var unit = s.Substring(position, length);
            if (position + length != s.Length)
            {
                error = $"'{text}': unexpected '{s.Substring(position + length)}' after the unit '{unit}'";
                return false;
            }

            var reading = UnitReader.Read(unit);
            if (reading.UnknownAtom is { } unknown)
            {
                error = $"unknown unit '{unknown}' (units are {UnitTable.Names})";
                return false;
            }

            if (reading.ExponentTooLarge)
            {
                error = $"an exponent in the unit '{unit}' is beyond the limit of {Limits.Exponent}";
                return false;
            }

            value = ExactNumber.Multiply(value, reading.Factor);
            dimension = reading.Dimension;
            hasUnit = true;
        }

        siValue = value.ToDouble();
        if (negative)
        {
            siValue = -siValue;
        }

        if (double.IsInfinity(siValue) || double.IsNaN(siValue))
        {
            error = $"'{text}' is beyond the range of finite numbers";
            return false;
        }

        return true;
    }
}
