using MotionSpec.CSharp.Naming;
using MotionSpec.Language.Binding.Symbols;

namespace MotionSpec.CSharp.Emission;

/// <summary>Writes the nested types every evaluator shares: Vec3, Parameters, State, PointMotion and FrameMotion.</summary>
internal static class EvaluatorTypesWriter
{
    public static void Write(CodeWriter w, string number, IReadOnlyList<ParamSymbol> parameters, IReadOnlyList<string> parameterValues,
        IReadOnlyList<CoordSymbol> coords, EvaluatorNames names)
    {
        w.Summary("Three components of a vector in the basis a report names.");
        w.Line("/// <param name=\"X\">Component along the basis frame's x axis.</param>");
        w.Line("/// <param name=\"Y\">Component along the basis frame's y axis.</param>");
        w.Line("/// <param name=\"Z\">Component along the basis frame's z axis.</param>");
        w.Line($"public readonly record struct Vec3({number} X, {number} Y, {number} Z);");
        w.Line();

        w.Summary("The spec's independent params in SI units. Params defined from other params are recomputed from these inside each evaluator.");
        w.Open("public struct Parameters");
        for (var i = 0; i < parameters.Count; i++)
        {
            var param = parameters[i];
            w.Summary(CommentTextFor($"Param {param.Name}, in {UnitText.Of(param.Dimension)}; the spec sets {parameterValues[i]}."));
            w.Line($"public {number} {CSharpIdentifier.Escape(names.Parameters[i])};");
            w.Line();
        }

        w.Summary("Every param at the value the spec gives it.");
        if (parameters.Count == 0)
        {
            w.Line("public static Parameters Default => new Parameters();");
        }
        else
        {
            w.Line("public static Parameters Default => new Parameters");
            w.Line("{");
            for (var i = 0; i < parameters.Count; i++)
            {
                w.Line($"    {CSharpIdentifier.Escape(names.Parameters[i])} = {parameterValues[i]},");
            }

            w.Line("};");
        }

        w.Close();
        w.Line();

        w.Summary("The generalized coordinates at one instant: each value, rate and acceleration, in SI units.");
        w.Open("public struct State");
        for (var i = 0; i < coords.Count; i++)
        {
            var coord = coords[i];
            var kind = coord.Kind == Language.Binding.CoordKind.Angle ? "an angle" : "a length";
            var field = names.Coords[i];
            w.Summary(CommentTextFor($"Coord {coord.Name}, {kind}, in {UnitText.CoordValue(coord.Kind)}."));
            w.Line($"public {number} {CSharpIdentifier.Escape(field.Value)};");
            w.Line();
            w.Summary(CommentTextFor($"Rate of {coord.Name} ({coord.Name}'), in {UnitText.CoordRate(coord.Kind)}."));
            w.Line($"public {number} {CSharpIdentifier.Escape(field.Rate)};");
            w.Line();
            w.Summary(CommentTextFor($"Acceleration of {coord.Name} ({coord.Name}''), in {UnitText.CoordAcceleration(coord.Kind)}."));
            w.Line($"public {number} {CSharpIdentifier.Escape(field.Acceleration)};");
            if (i + 1 < coords.Count)
            {
                w.Line();
            }
        }

        w.Close();
        w.Line();

        w.Summary("The motion of a point seen from an observer frame; the five terms add up to the acceleration. All vectors in the report's basis.");
        w.Line("/// <param name=\"Position\">Position relative to the observer's origin, m.</param>");
        w.Line("/// <param name=\"Velocity\">Velocity as seen in the observer, m/s.</param>");
        w.Line("/// <param name=\"Acceleration\">Acceleration as seen in the observer, m/s^2.</param>");
        w.Line("/// <param name=\"Relative\">Acceleration as seen in the moving frame, m/s^2.</param>");
        w.Line("/// <param name=\"Centripetal\">Centripetal acceleration, omega x (omega x r), m/s^2.</param>");
        w.Line("/// <param name=\"Angular\">Angular-acceleration term, alpha x r, m/s^2.</param>");
        w.Line("/// <param name=\"Coriolis\">Coriolis acceleration, 2 omega x v_rel, m/s^2.</param>");
        w.Line("/// <param name=\"Origin\">Acceleration of the moving frame's origin as seen in the observer, m/s^2.</param>");
        w.Line("public readonly record struct PointMotion(Vec3 Position, Vec3 Velocity, Vec3 Acceleration,");
        w.Line("    Vec3 Relative, Vec3 Centripetal, Vec3 Angular, Vec3 Coriolis, Vec3 Origin);");
        w.Line();

        w.Summary("The motion of a frame seen from an observer frame, all vectors in the report's basis.");
        w.Line("/// <param name=\"AngularVelocity\">Angular velocity relative to the observer, rad/s.</param>");
        w.Line("/// <param name=\"AngularAcceleration\">Angular acceleration relative to the observer, rad/s^2.</param>");
        w.Line("/// <param name=\"OriginPosition\">Position of the frame's origin relative to the observer's origin, m.</param>");
        w.Line("/// <param name=\"OriginVelocity\">Velocity of the frame's origin as seen in the observer, m/s.</param>");
        w.Line("/// <param name=\"OriginAcceleration\">Acceleration of the frame's origin as seen in the observer, m/s^2.</param>");
        w.Line("public readonly record struct FrameMotion(Vec3 AngularVelocity, Vec3 AngularAcceleration,");
        w.Line("    Vec3 OriginPosition, Vec3 OriginVelocity, Vec3 OriginAcceleration);");
    }

    private static string CommentTextFor(string text) => Text.CommentText.Xml(text);
}
