namespace MotionSpec.CSharp.Naming;

/// <summary>
/// Every name the generated file declares, chosen once per spec so that none collides in C#. The fixed API
/// (Vec3, Parameters, State, PointMotion, FrameMotion and their members) never moves; a spec name that would
/// clash with it, with the class, or with a generated rate name (<c>psi_dot</c> beside a coord <c>psi</c>)
/// gets <c>_</c> appended until it is unique, and the rename is recorded for a warning.
/// </summary>
public sealed class EvaluatorNames
{
    /// <summary>Names of the generated types and their members, which spec names must not take.</summary>
    public static IReadOnlyList<string> FixedApiNames { get; } =
    [
        "Vec3", "Parameters", "State", "PointMotion", "FrameMotion", "Default",
        "X", "Y", "Z", "Position", "Velocity", "Acceleration", "Relative", "Centripetal", "Angular", "Coriolis",
        "Origin", "AngularVelocity", "AngularAcceleration", "OriginPosition", "OriginVelocity", "OriginAcceleration",
    ];

    // Members every type inherits or a record synthesizes; a field of that name would hide one (a warning,
    // so an error under warnings-as-errors), and Math, MathF and System must keep meaning the framework's.
    private static readonly string[] InheritedOrFrameworkNames =
    [
        "Equals", "GetHashCode", "ToString", "GetType", "MemberwiseClone", "Finalize", "ReferenceEquals",
        "Deconstruct", "EqualityContract", "PrintMembers", "Math", "MathF", "System", "global",
    ];

    private EvaluatorNames(string className, IReadOnlyList<string> parameters, IReadOnlyList<CoordNames> coords,
        IReadOnlyList<string> reportMethods, IReadOnlyList<Rename> renames)
    {
        ClassName = className;
        Parameters = parameters;
        Coords = coords;
        ReportMethods = reportMethods;
        Renames = renames;
    }

    /// <summary>The static class (unescaped).</summary>
    public string ClassName { get; }

    /// <summary>Field of each independent param, in the order given (unescaped).</summary>
    public IReadOnlyList<string> Parameters { get; }

    /// <summary>The three fields of each coord, in the order given (unescaped).</summary>
    public IReadOnlyList<CoordNames> Coords { get; }

    /// <summary>Method of each report, in the order given.</summary>
    public IReadOnlyList<string> ReportMethods { get; }

    /// <summary>Every name that differs from what the spec wrote, in the order chosen.</summary>
    public IReadOnlyList<Rename> Renames { get; }

    /// <summary>Chooses every name. <paramref name="className"/> must be an identifier; the others are spec names.</summary>
    public static EvaluatorNames Choose(string className, IReadOnlyList<string> parameters, IReadOnlyList<string> coords,
        IReadOnlyList<string> reports)
    {
        var renames = new List<Rename>();
        var fixedNames = new HashSet<string>(FixedApiNames.Concat(InheritedOrFrameworkNames), StringComparer.Ordinal);

        var finalClass = className;
        while (fixedNames.Contains(finalClass))
        {
            finalClass += "_";
        }

        if (finalClass != className)
        {
            renames.Add(new Rename("class", className, finalClass, "a name the generated file already uses", -1));
        }

        fixedNames.Add(finalClass);

        // Class scope: the report methods.
        var methodScope = new HashSet<string>(fixedNames, StringComparer.Ordinal);
        var methods = new List<string>();
        for (var i = 0; i < reports.Count; i++)
        {
            var wanted = UpperFirst(reports[i]);
            methods.Add(Claim(methodScope, wanted, name => Reason(name, finalClass, fixedNames, "another report method"),
                "report method", reports[i], i, renames));
        }

        // Parameters scope.
        var paramScope = new HashSet<string>(fixedNames, StringComparer.Ordinal);
        var paramFields = new List<string>();
        for (var i = 0; i < parameters.Count; i++)
        {
            paramFields.Add(Claim(paramScope, parameters[i], name => Reason(name, finalClass, fixedNames, "another param"),
                "param", parameters[i], i, renames));
        }

        // State scope: rate and acceleration names of the coords as written are reserved first, so that a coord
        // named psi_dot yields to the rate of psi rather than the other way round.
        var generatedRates = new HashSet<string>(StringComparer.Ordinal);
        foreach (var coord in coords)
        {
            generatedRates.Add(coord + "_dot");
            generatedRates.Add(coord + "_ddot");
        }

        var stateScope = new HashSet<string>(fixedNames, StringComparer.Ordinal);
        var values = new List<string>();
        for (var i = 0; i < coords.Count; i++)
        {
            var name = coords[i];
            var reason = (string?)null;
            while (stateScope.Contains(name) || generatedRates.Contains(name))
            {
                reason ??= generatedRates.Contains(name) && !stateScope.Contains(name)
                    ? "the generated rate field of another coord"
                    : Reason(name, finalClass, fixedNames, "another coord");
                name += "_";
            }

            stateScope.Add(name);
            values.Add(name);
            if (reason is not null)
            {
                renames.Add(new Rename("coord", coords[i], name, reason, i));
            }
        }

        var coordNames = new List<CoordNames>();
        for (var i = 0; i < coords.Count; i++)
        {
            var rate = Claim(stateScope, values[i] + "_dot", _ => "another name of the State struct", "rate of coord", coords[i] + "'", i, renames);
            var acceleration = Claim(stateScope, values[i] + "_ddot", _ => "another name of the State struct", "acceleration of coord", coords[i] + "''", i, renames);
            coordNames.Add(new CoordNames(values[i], rate, acceleration));
        }

        return new EvaluatorNames(finalClass, paramFields, coordNames, methods, renames);
    }

    /// <summary>The report name with its first letter upper-cased, as the method is named before any clash.</summary>
    public static string UpperFirst(string name) =>
        name.Length == 0 ? name : char.ToUpperInvariant(name[0]) + name.Substring(1);

    private static string Claim(HashSet<string> scope, string wanted, Func<string, string> reasonFor, string what,
        string specName, int index, List<Rename> renames)
    {
        var name = wanted;
        var reason = (string?)null;
        while (scope.Contains(name))
        {
            reason ??= reasonFor(name);
            name += "_";
        }

        scope.Add(name);
        if (reason is not null)
        {
            renames.Add(new Rename(what, specName, name, reason, index));
        }

        return name;
    }

    private static string Reason(string name, string className, HashSet<string> fixedNames, string sameScope)
    {
        if (name == className)
        {
            return "the generated class";
        }

        if (FixedApiNames.Contains(name))
        {
            return "a generated type or member of the same name";
        }

        return fixedNames.Contains(name) ? "a name C# or the framework already gives a meaning" : sameScope;
    }
}

/// <summary>The State fields of one coord: its value, rate and acceleration.</summary>
/// <param name="Value">The coord's value, <c>psi</c>.</param>
/// <param name="Rate">Its rate, <c>psi_dot</c>.</param>
/// <param name="Acceleration">Its acceleration, <c>psi_ddot</c>.</param>
public sealed record CoordNames(string Value, string Rate, string Acceleration);
