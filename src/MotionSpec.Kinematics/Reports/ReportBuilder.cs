using MotionSpec.Kinematics.Frames;
using MotionSpec.Kinematics.Lowering;
using MotionSpec.Language.Binding;
using MotionSpec.Language.Binding.Symbols;
using MotionSpec.Symbolic;

namespace MotionSpec.Kinematics.Reports;

/// <summary>
/// Derives the closed forms of one report. For a point P in frame F seen from A, with the five terms taken
/// relative to B: r = P relative to B's origin, v_rel and a_rel its derivatives taken in B, omega and alpha of B
/// relative to A; centripetal = omega x (omega x r), angular = alpha x r, coriolis = 2 omega x v_rel, origin = the
/// second derivative in A of B's origin. Cross products are formed in the basis of each part of r, where they are
/// simplest, and every result is written in the report's basis at the end.
/// </summary>
internal sealed class ReportBuilder(
    ExpressionLowering lowering,
    BasisConverter converter,
    AngularMotion angular,
    VectorDerivative derivative)
{
    // Above this many distinct nodes a closed form is kept as composed (see Tidy).
    private const int SimplifyNodeLimit = 60;

    private readonly Dictionary<int, FrameVector> _origins = [];

    public ReportMotion Build(ReportSymbol report)
    {
        var values = report.Kind == ReportKind.Point ? PointReport(report) : FrameReport(report);

        // Vectors that reach the report's basis through a composed rotation matrix all share its entries; a
        // component simplified on its own would expand them into a form of its own, which every consumer then
        // computes a second time (the relative term of a six-link arm repeated two matrix entries so).
        var moving = report.Kind == ReportKind.Point ? report.Via! : report.SubjectFrame;
        var composed = Math.Max(FrameTree.Distance(moving, report.Basis), FrameTree.Distance(report.SubjectFrame, report.Basis))
            >= BasisConverter.ComposedPathLength;
        Expr Tidy(Expr e) => composed ? e : TidyAlone(e);
        var inBasis = values.ToDictionary(p => p.Key, p => p.Value.Map(Tidy));
        if (report.Kind == ReportKind.Point)
        {
            // The sum of the terms as they will be read, so that the identity holds exactly in every consumer.
            var sum = QuantityInfo.Terms.Aggregate(Vector3Expr.Zero, (total, term) => total + inBasis[term]);
            inBasis[Quantity.Acceleration] = sum.Map(Tidy);
        }

        return new ReportMotion(report, report.Kind == ReportKind.Point ? QuantityInfo.PointQuantities : QuantityInfo.FrameQuantities, inBasis);
    }

    /// <summary>
    /// Simplifies a closed form an engineer will read. Long chains are left as composed: their shared structure is
    /// what keeps them linear in size, and hand-style simplification of them costs more than it gives.
    /// </summary>
    private static Expr TidyAlone(Expr e) => ExprMetrics.NodeCount(e) <= SimplifyNodeLimit ? Simplifier.Simplify(e) : e;

    /// <summary>The position of F's origin relative to B's origin, as parts along the tree path.</summary>
    public FrameVector OriginOffset(FrameSymbol frame, FrameSymbol from)
    {
        var ancestor = FrameTree.CommonAncestor(frame, from);
        var offset = FrameVector.Zero;
        foreach (var link in FrameTree.PathBelow(ancestor, frame))
        {
            offset = offset.Plus(Origin(link));
        }

        foreach (var link in FrameTree.PathBelow(ancestor, from))
        {
            offset = offset.Minus(Origin(link));
        }

        return offset;
    }

    /// <summary>A frame's origin relative to its parent, lowered once.</summary>
    public FrameVector Origin(FrameSymbol frame)
    {
        if (!_origins.TryGetValue(frame.Index, out var origin))
        {
            origin = frame.Origin is { } written ? lowering.Vector(written) : FrameVector.Zero;
            _origins[frame.Index] = origin;
        }

        return origin;
    }

    private Dictionary<Quantity, Vector3Expr> PointReport(ReportSymbol report)
    {
        var point = report.Point!;
        var frame = point.Frame;
        var observer = report.Observer;
        var via = report.Via!;
        var basis = report.Basis;

        var inFrame = lowering.Vector(point.Position);
        var fromObserver = inFrame.Plus(OriginOffset(frame, observer));
        var fromVia = inFrame.Plus(OriginOffset(frame, via));

        var relativeVelocity = derivative.First(fromVia, via);
        var omega = angular.Velocity(via, observer);
        var alpha = angular.Acceleration(via, observer);
        var two = Expr.Number(2);

        // omega and alpha are known in the moving frame's basis; bring them to each part's basis once.
        FrameVector CrossWith(Vector3Expr w, FrameVector x) =>
            x.MapParts((b, part) => Vector3Expr.Cross(converter.Convert(w, via, b), part));

        var relative = converter.ToBasis(derivative.Second(fromVia, via), basis);
        var centripetal = converter.ToBasis(CrossWith(omega, CrossWith(omega, fromVia)), basis);
        var angularTerm = converter.ToBasis(CrossWith(alpha, fromVia), basis);
        var coriolis = converter.ToBasis(CrossWith(omega, relativeVelocity).Scaled(two), basis);
        var origin = converter.ToBasis(derivative.Second(OriginOffset(via, observer), observer), basis);

        // The acceleration is not derived here: Build makes it the five-term sum itself, since the terms are
        // needed anyway and deriving the whole path a second time is what made long chains costly. Its
        // independent checks are verify's numeric path and the kinematics tests' plain differentiation.
        return new Dictionary<Quantity, Vector3Expr>
        {
            [Quantity.Position] = converter.ToBasis(fromObserver, basis),
            [Quantity.Velocity] = converter.ToBasis(derivative.First(fromObserver, observer), basis),
            [Quantity.Relative] = relative,
            [Quantity.Centripetal] = centripetal,
            [Quantity.Angular] = angularTerm,
            [Quantity.Coriolis] = coriolis,
            [Quantity.Origin] = origin,
        };
    }

    private Dictionary<Quantity, Vector3Expr> FrameReport(ReportSymbol report)
    {
        var frame = report.SubjectFrame;
        var observer = report.Observer;
        var basis = report.Basis;
        var origin = OriginOffset(frame, observer);
        return new Dictionary<Quantity, Vector3Expr>
        {
            [Quantity.AngularVelocity] = converter.Convert(angular.Velocity(frame, observer), frame, basis),
            [Quantity.AngularAcceleration] = converter.Convert(angular.Acceleration(frame, observer), frame, basis),
            [Quantity.OriginPosition] = converter.ToBasis(origin, basis),
            [Quantity.OriginVelocity] = converter.ToBasis(derivative.First(origin, observer), basis),
            [Quantity.OriginAcceleration] = converter.ToBasis(derivative.Second(origin, observer), basis),
        };
    }
}
