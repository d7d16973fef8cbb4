using MotionSpec.Derivation.Geometry;
using MotionSpec.Kinematics;
using MotionSpec.Language.Binding;
using MotionSpec.Symbolic;

namespace MotionSpec.Derivation.Checks;

/// <summary>
/// Independent forms of a report's vectors, built here from the frame tree rather than taken from the
/// kinematics stage, and the comparisons the derivation states: the sum of the five terms against the
/// position differentiated twice in the observer, and each term against its defining formula.
/// </summary>
internal sealed class ReportChecks
{
    private ReportChecks(Vector3Expr? relativePosition, Vector3Expr? relativeVelocity, RotationChain? moving, Agreement sum, Agreement total, Agreement terms)
    {
        RelativePosition = relativePosition;
        RelativeVelocity = relativeVelocity;
        Moving = moving;
        SumAgainstDirect = sum;
        TotalAgainstSum = total;
        TermsAgainstDefinitions = terms;
    }

    /// <summary>r: the point relative to the moving frame's origin, in the report's basis (point reports).</summary>
    public Vector3Expr? RelativePosition { get; }

    /// <summary>v_rel: the point's velocity as seen in the moving frame, in the report's basis (point reports).</summary>
    public Vector3Expr? RelativeVelocity { get; }

    /// <summary>omega and alpha of the moving frame (or subject frame) relative to the observer, in the report's basis.</summary>
    public RotationChain? Moving { get; }

    /// <summary>Point reports: sum of the terms against direct differentiation. Frame reports: the origin's velocity and acceleration against its position differentiated.</summary>
    public Agreement SumAgainstDirect { get; }

    /// <summary>Point reports: the stated acceleration against the sum of the terms. Frame reports: omega and alpha against their composition.</summary>
    public Agreement TotalAgainstSum { get; }

    /// <summary>Point reports: each term against its defining formula evaluated from r, v_rel, omega, alpha.</summary>
    public Agreement TermsAgainstDefinitions { get; }

    public static ReportChecks Run(KinematicModel model, FrameGeometry geometry, ReportMotion motion)
    {
        var reportIndex = motion.Report.Index;
        var report = motion.Report;
        var seed = 7919 * (reportIndex + 1);
        var observer = report.Observer;
        var basis = report.Basis;
        var basisInObserver = geometry.Compose(observer, basis, basis);

        if (report.Kind == ReportKind.Frame)
        {
            var chain = geometry.Compose(observer, report.SubjectFrame, basis);
            var rotation = chain is null
                ? NotChecked("the subject frame's angular velocity cannot be composed in this basis")
                : Agreement.Compare(model, Pairs((motion[Quantity.AngularVelocity], chain.Omega), (motion[Quantity.AngularAcceleration], chain.Alpha)), seed);
            var originVelocity = basisInObserver is null ? null : Vector3Algebra.DerivativeSeenFrom(motion[Quantity.OriginPosition], basisInObserver.Omega);
            var originAcceleration = originVelocity is null || basisInObserver is null ? null : Vector3Algebra.DerivativeSeenFrom(originVelocity.Value, basisInObserver.Omega);
            var origin = originAcceleration is null
                ? NotChecked("the origin's position cannot be differentiated in the observer here")
                : Agreement.Compare(model, Pairs((motion[Quantity.OriginVelocity], originVelocity!.Value), (motion[Quantity.OriginAcceleration], originAcceleration.Value)), seed + 1);
            return new ReportChecks(null, null, chain, origin, rotation, NotChecked("a frame report has no terms"));
        }

        var moving = report.Via ?? report.SubjectFrame;
        var terms = QuantityInfo.Terms.Select(q => motion[q]).ToArray();
        var sum = terms.Aggregate(Vector3Expr.Zero, Vector3Algebra.Add);
        var total = Agreement.Compare(model, Pairs((motion[Quantity.Acceleration], sum)), seed);

        // Direct: the position relative to the observer's origin, differentiated twice in the observer.
        Agreement direct;
        if (basisInObserver is null)
        {
            direct = NotChecked("the report's basis cannot be related to the observer here");
        }
        else
        {
            var velocity = Vector3Algebra.DerivativeSeenFrom(motion[Quantity.Position], basisInObserver.Omega);
            var acceleration = velocity is null ? null : Vector3Algebra.DerivativeSeenFrom(velocity.Value, basisInObserver.Omega);
            direct = acceleration is null
                ? NotChecked("differentiating the position twice would need a third derivative of a coord")
                : Agreement.Compare(model, Pairs((sum, acceleration.Value), (motion[Quantity.Velocity], velocity!.Value)), seed + 1);
        }

        // Each term from its definition, with r, v_rel, omega and alpha built here.
        var chainOfMoving = geometry.Compose(observer, moving, basis);
        var basisInMoving = geometry.Compose(moving, basis, basis);
        var originOfMoving = geometry.OriginPosition(observer, moving, basis);
        Vector3Expr? r = originOfMoving is null ? null : Vector3Algebra.Simplify(Vector3Algebra.Subtract(motion[Quantity.Position], originOfMoving.Value));
        Vector3Expr? vRel = r is null || basisInMoving is null ? null : Vector3Algebra.DerivativeSeenFrom(r.Value, basisInMoving.Omega);
        Vector3Expr? aRel = vRel is null || basisInMoving is null ? null : Vector3Algebra.DerivativeSeenFrom(vRel.Value, basisInMoving.Omega);
        Vector3Expr? originVelocityOfMoving = originOfMoving is null || basisInObserver is null ? null : Vector3Algebra.DerivativeSeenFrom(originOfMoving.Value, basisInObserver.Omega);
        Vector3Expr? originAccelerationOfMoving = originVelocityOfMoving is null || basisInObserver is null ? null : Vector3Algebra.DerivativeSeenFrom(originVelocityOfMoving.Value, basisInObserver.Omega);
        Agreement definitions;
        if (r is null || vRel is null || aRel is null || chainOfMoving is null || originAccelerationOfMoving is null)
        {
            definitions = NotChecked("the moving frame's motion cannot be written in the report's basis here");
        }
        else
        {
            var w = chainOfMoving.Omega;
            var a = chainOfMoving.Alpha;
            definitions = Agreement.Compare(
                model,
                Pairs(
                    (motion[Quantity.Relative], aRel.Value),
                    (motion[Quantity.Centripetal], Vector3Algebra.Cross(w, Vector3Algebra.Cross(w, r.Value))),
                    (motion[Quantity.Angular], Vector3Algebra.Cross(a, r.Value)),
                    (motion[Quantity.Coriolis], Vector3Algebra.Scale(Expr.Number(2), Vector3Algebra.Cross(w, vRel.Value))),
                    (motion[Quantity.Origin], originAccelerationOfMoving.Value)),
                seed + 2);
        }

        return new ReportChecks(
            r,
            vRel is null ? null : Vector3Algebra.Simplify(vRel.Value),
            chainOfMoving,
            direct,
            total,
            definitions);
    }

    private static Agreement NotChecked(string reason) => new(AgreementMethod.NotChecked, 0, 0, reason);

    private static List<(Expr A, Expr B)> Pairs(params (Vector3Expr A, Vector3Expr B)[] vectors) =>
        vectors.SelectMany(v => Enumerable.Range(0, 3).Select(i => (v.A[i], v.B[i]))).ToList();
}
