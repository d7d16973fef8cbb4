using MotionSpec.Language.Binding;
using MotionSpec.Language.Binding.Symbols;

namespace MotionSpec.Evaluation.Inputs;

/// <summary>
/// Reads <c>--set NAME=VALUE</c>: an independent param's value, or a coord's value (<c>psi</c>), rate
/// (<c>psi'</c>) or acceleration (<c>psi''</c>). A value without a unit is in SI for what it sets; a unit of
/// another dimension, a unit on a param defined without units, a derived param or an unknown name is refused.
/// </summary>
public static class SettingParser
{
    /// <summary>
    /// Parses every setting in order (a later one for the same name wins). On failure
    /// <paramref name="errors"/> holds one message per bad setting, for the command line (exit 2).
    /// </summary>
    public static bool TryParse(BoundSpec spec, IEnumerable<string> settings, out EvaluationInputs inputs, out IReadOnlyList<string> errors)
    {
        ArgumentNullException.ThrowIfNull(spec);
        ArgumentNullException.ThrowIfNull(settings);
        var overrides = new double?[spec.Parameters.Count];
        var coords = new CoordSetting[spec.Coords.Count];
        var problems = new List<string>();
        foreach (var setting in settings)
        {
            var problem = Apply(spec, setting, overrides, coords);
            if (problem is not null)
            {
                problems.Add($"--set '{setting}': {problem}");
            }
        }

        inputs = new EvaluationInputs(overrides, coords);
        errors = problems;
        return problems.Count == 0;
    }

    private static string? Apply(BoundSpec spec, string setting, double?[] overrides, CoordSetting[] coords)
    {
        var equals = setting.IndexOf('=', StringComparison.Ordinal);
        if (equals < 0)
        {
            return "expected NAME=VALUE, such as L=12 m or psi'=10 deg/s";
        }

        var target = setting[..equals].Trim();
        var text = setting[(equals + 1)..].Trim();
        var name = target.TrimEnd('\'');
        var marks = target.Length - name.Length;
        if (name.Length == 0)
        {
            return "a param or coord name is missing before '='";
        }

        var param = spec.Parameters.FirstOrDefault(p => p.Name == name);
        var coord = spec.Coords.FirstOrDefault(c => c.Name == name);
        if (param is null && coord is null)
        {
            return Unknown(spec, name);
        }

        if (marks > 2)
        {
            return $"'{target}' has {marks} marks; a coord takes at most two (rate ' and acceleration '')";
        }

        if (param is not null && marks > 0)
        {
            return $"'{name}' is a param, and only coords take marks";
        }

        if (param is { IsDerived: true })
        {
            var definition = spec.Source.GetText(param.Definition.Span);
            return $"param '{name}' is derived from other params ({name} = {definition}) and is recomputed from them; set those instead";
        }

        if (!QuantityText.TryParse(text, out var quantity, out var unreadable))
        {
            return $"the value '{text}' {unreadable}";
        }

        if (!double.IsFinite(quantity.Value))
        {
            return $"the value '{text}' is too large for a double";
        }

        if (param is not null)
        {
            if (quantity.Unit is { } unit)
            {
                if (param.Dimension.IsFree)
                {
                    return $"param '{name}' is defined without units, so it takes a plain number only";
                }

                if (unit != param.Dimension)
                {
                    return $"param '{name}' takes a value of {param.Dimension}, but '{text}' is of {unit}";
                }
            }

            overrides[param.Index] = quantity.Value;
            return null;
        }

        var expected = Dimension.Of(coord!.Dimension.Length, -marks);
        if (quantity.Unit is { } given && given != expected)
        {
            return $"'{target}' takes a value of {expected}, but '{text}' is of {given}";
        }

        var current = coords[coord.Index];
        coords[coord.Index] = marks switch
        {
            0 => current with { Value = quantity.Value },
            1 => current with { Rate = quantity.Value },
            _ => current with { Acceleration = quantity.Value },
        };
        return null;
    }

    private static string Unknown(BoundSpec spec, string name)
    {
        var other = spec.Lets.Cast<Symbol>().Concat(spec.Frames).Concat(spec.Points).Concat(spec.Reports).FirstOrDefault(s => s.Name == name);
        if (other is not null)
        {
            return $"'{name}' is a {other.KindName}; only params and coords can be set";
        }

        var candidates = spec.Parameters.Where(p => !p.IsDerived).Select(p => p.Name).Concat(spec.Coords.Select(c => c.Name));
        var suggestion = NameSuggestions.Closest(name, candidates);
        return suggestion is null
            ? $"no param or coord is named '{name}'"
            : $"no param or coord is named '{name}'; did you mean '{suggestion}'?";
    }
}
