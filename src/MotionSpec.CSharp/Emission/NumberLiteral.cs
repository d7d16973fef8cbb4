using System.Globalization;

namespace MotionSpec.CSharp.Emission;

/// <summary>C# literals for SI values, round-trip exact, independent of the machine's culture.</summary>
internal static class NumberLiteral
{
    /// <summary>A double literal such as <c>18.0</c> or <c>2E-05</c>; null when the value is not finite.</summary>
    public static string? Double(double value)
    {
        if (double.IsNaN(value) || double.IsInfinity(value))
        {
            return null;
        }

        var text = value.ToString("R", CultureInfo.InvariantCulture);
        return text.IndexOfAny(['.', 'E', 'e']) < 0 ? text + ".0" : text;
    }

    /// <summary>A float literal such as <c>18f</c>; null when the value does not fit a float.</summary>
    public static string? Float(double value)
    {
        var single = (float)value;
        if (float.IsNaN(single) || float.IsInfinity(single))
        {
            return null;
        }

        return single.ToString("R", CultureInfo.InvariantCulture) + "f";
    }
}
