using MotionSpec.Kinematics.Frames;
using MotionSpec.Kinematics.Lowering;
using MotionSpec.Language.Binding;
using MotionSpec.Language.Binding.Symbols;
using MotionSpec.Language.Diagnostics;

namespace MotionSpec.Kinematics.Reports;

/// <summary>
/// Decides whether a report can be written in its basis. Its ingredients are the point and origin vectors and
/// the link angular velocities along the tree joining the subject's frame, the moving frame, the observer and
/// every frame whose basis those vectors name. Each must be zero by construction (an omitted origin, a link that
/// neither rotates nor spins) or lie in a basis related to the report's basis.
/// </summary>
internal sealed class ReportLegality(FrameTree tree)
{
    public bool Check(ReportSymbol report, DiagnosticBag diagnostics)
    {
        var basis = report.Basis;
        var ingredients = new List<(FrameSymbol Basis, string What)>();
        var joined = new HashSet<FrameSymbol> { report.SubjectFrame, report.Observer };
        if (report.Via is { } via)
        {
            joined.Add(via);
        }

        if (report.Point is { } point)
        {
            var pointBases = new HashSet<FrameSymbol>();
            ExpressionLowering.CollectBases(point.Position, pointBases);
            foreach (var b in pointBases.OrderBy(f => f.Index))
            {
                ingredients.Add((b, $"the position of point '{point.Name}'"));
                joined.Add(b);
            }
        }

        // Grow the joined set until the links it spans name no new bases.
        var links = new SortedDictionary<int, FrameSymbol>();
        var queue = new Queue<FrameSymbol>(joined);
        while (queue.Count > 0)
        {
            var f = queue.Dequeue();
            if (!FrameTree.SameTree(f, report.SubjectFrame))
            {
                return Unrelated(report, f, diagnostics);
            }

            var top = joined.Aggregate(FrameTree.CommonAncestor);
            foreach (var member in joined.ToList())
            {
                foreach (var link in FrameTree.PathBelow(top, member))
                {
                    if (links.ContainsKey(link.Index))
                    {
                        continue;
                    }

                    links[link.Index] = link;
                    if (link.Origin is { } origin)
                    {
                        var originBases = new HashSet<FrameSymbol>();
                        ExpressionLowering.CollectBases(origin, originBases);
                        foreach (var b in originBases.OrderBy(x => x.Index))
                        {
                            ingredients.Add((b, $"the origin of frame '{link.Name}'"));
                            if (joined.Add(b))
                            {
                                queue.Enqueue(b);
                            }
                        }
                    }
                }
            }
        }

        foreach (var link in links.Values)
        {
            if (FrameOrientation.Turns(link))
            {
                ingredients.Add((link, $"the angular velocity of frame '{link.Name}' relative to '{link.Parent!.Name}'"));
            }
        }

        foreach (var (b, what) in ingredients)
        {
            if (!FrameTree.SameTree(b, basis))
            {
                return Unrelated(report, b, diagnostics);
            }

            if (!tree.AreRelated(b, basis))
            {
                var spin = FrameTree.SpinLinkBetween(b, basis)!;
                diagnostics.Error(
                    KinematicsDiagnosticCodes.UnknownOrientation,
                    report.StatementSpan,
                    $"report '{report.Name}' cannot be written in the basis of '{basis.Name}': {what} is known in the basis of '{b.Name}', " +
                    $"and spin frame '{spin.Name}' lies in the way; its orientation relative to '{spin.Parent!.Name}' is unknown (only its rates are given). " +
                    "Choose a basis on the same side of the spin frame, or observe from a frame that avoids it.");
                return false;
            }
        }

        return true;
    }

    private static bool Unrelated(ReportSymbol report, FrameSymbol other, DiagnosticBag diagnostics)
    {
        diagnostics.Error(
            KinematicsDiagnosticCodes.UnrelatedTrees,
            report.StatementSpan,
            $"report '{report.Name}' uses the basis of frame '{other.Name}', which is in another tree than '{report.SubjectFrame.Name}' (root '{other.Root.Name}'), so no rotation relates them");
        return false;
    }
}
