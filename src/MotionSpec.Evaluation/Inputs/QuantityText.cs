using MotionSpec.Language;

namespace MotionSpec.Evaluation.Inputs;

/// <summary>Reads a command-line value such as <c>10 deg/s</c> with the language's own number and unit rules.</summary>
internal static class QuantityText
{
    /// <summary>
    /// On success, the value in SI and its unit's dimension (null without a unit); on failure
    /// <paramref name="problem"/> says why, worded to follow the value's text.
    /// </summary>
    public static bool TryParse(string text, out ParsedQuantity quantity, out string? problem)
    {
        if (!QuantityLiteral.TryParse(text, out var value, out var dimension, out var hasUnit, out var error))
        {
            quantity = default;
            problem = $"cannot be read: {error}";
            return false;
        }

        quantity = new ParsedQuantity(value, hasUnit ? dimension : null);
        problem = null;
        return true;
    }
}
