using MotionSpec.Kinematics.Frames;
using MotionSpec.Kinematics.Lowering;
using MotionSpec.Kinematics.Reports;
using MotionSpec.Language.Binding;
using MotionSpec.Language.Diagnostics;
using MotionSpec.Symbolic;

namespace MotionSpec.Kinematics;

/// <summary>The kinematics pass: from a bound spec to the closed forms of every report, or located MOT4 errors.</summary>
public static class KinematicsPass
{
    /// <summary>Derives every frame's and report's motion; reports that cannot be derived get an error each.</summary>
    public static KinematicModel Run(BoundSpec spec, DiagnosticBag diagnostics)
    {
        var issues = new DerivationIssues();
        var derivatives = new TimeDerivatives(issues);
        var lowering = new ExpressionLowering();
        var tree = new FrameTree(spec.Frames);
        var orientation = new FrameOrientation(lowering.Scalar, spin => OwnBracket(lowering, spin), derivatives);
        var converter = new BasisConverter(orientation, issues);
        lowering.UseConverter(converter);
        var angular = new AngularMotion(orientation, converter);
        var builder = new ReportBuilder(lowering, converter, angular, new VectorDerivative(angular, derivatives));
        var legality = new ReportLegality(tree);

        var parameters = spec.Parameters
            .Select(p => new ParameterDefinition(p, KinematicModel.SymbolOf(p), lowering.Scalar(p.Definition)))
            .ToList();

        var reports = new List<ReportMotion>();
        foreach (var report in spec.Reports)
        {
            if (!legality.Check(report, diagnostics))
            {
                continue;
            }

            issues.Clear();
            var motion = builder.Build(report);
            if (issues.MissingDerivativeOf is { } symbol)
            {
                var marks = new string('\'', symbol.Order);
                diagnostics.Error(
                    KinematicsDiagnosticCodes.DerivativeNotAvailable,
                    report.StatementSpan,
                    $"report '{report.Name}' needs the time derivative of {symbol.Name}{marks}, which is a third derivative of coord '{symbol.Name}'; " +
                    "only a coord's value, rate (') and acceleration ('') are known. Use marks of lower order in positions and angles.");
            }
            else if (issues.UnknownOrientationOf is { } spin)
            {
                diagnostics.Error(
                    KinematicsDiagnosticCodes.UnknownOrientation,
                    report.StatementSpan,
                    $"report '{report.Name}' needs the orientation of spin frame '{spin.Name}' relative to '{spin.Parent!.Name}', which is unknown (only its rates are given)");
            }
            else
            {
                reports.Add(motion);
            }
        }

        // Frame motions are for derivations; they are derived after the reports so that their issues stay theirs.
        var frames = new List<FrameMotion>();
        foreach (var frame in spec.Frames)
        {
            issues.Clear();
            var omega = frame.Parent is null ? Vector3Expr.Zero : orientation.LinkAngularVelocity(frame);
            var alpha = frame.Parent is null ? Vector3Expr.Zero : orientation.LinkAngularAcceleration(frame);
            Vector3Expr? origin = null;
            if (frame.Parent is { } parent && frame.Origin is not null)
            {
                var inParent = converter.ToBasis(builder.Origin(frame), parent);
                origin = issues.Any ? null : inParent.Map(Simplifier.Simplify);
            }

            var rotation = frame.Parent is null ? null : orientation.Rotation(frame);
            frames.Add(new FrameMotion(frame, rotation, omega.Map(Simplifier.Simplify), alpha.Map(Simplifier.Simplify), origin));
        }

        return new KinematicModel(spec, parameters, frames, reports, angular.Compose);
    }

    private static Vector3Expr OwnBracket(ExpressionLowering lowering, Language.Binding.Expressions.BoundExpr spin)
    {
        // A spin is a bare bracket in the frame's own basis, so its one part is that basis.
        var vector = lowering.Vector(spin);
        return vector.Parts.Select(p => p.Value).DefaultIfEmpty(Vector3Expr.Zero).First();
    }
}
