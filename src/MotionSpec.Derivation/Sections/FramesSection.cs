using MotionSpec.Derivation.Document;
using MotionSpec.Derivation.Geometry;
using MotionSpec.Language.Binding;
using MotionSpec.Language.Binding.Symbols;

namespace MotionSpec.Derivation.Sections;

/// <summary>
/// Each frame relative to its parent (rotation, angular velocity and acceleration, origin), then composed to
/// each observer a report uses, link by link, with the cross term of every composition.
/// </summary>
internal static class FramesSection
{
    public static void Add(List<Block> blocks, DerivationContext context)
    {
        var spec = context.Model.Spec;
        var compositions = CompositionsUsed(context.Reports.Select(r => r.Report));
        blocks.Add(new Heading(1, "Frames"));
        if (spec.Frames.All(f => f.Parent is null))
        {
            blocks.Add(new Paragraph(new Words("Every frame of the spec is a root: none moves relative to another.")));
        }

        foreach (var frame in spec.Frames)
        {
            var wanted = compositions.Where(c => ReferenceEquals(c.Frame, frame)).ToList();
            if (frame.Parent is null)
            {
                if (wanted.Count == 0)
                {
                    continue;
                }

                blocks.Add(new Heading(2, $"Frame {frame.Name} (a root)"));
            }
            else
            {
                blocks.Add(new Heading(2, $"Frame {frame.Name} in {frame.Parent.Name}"));
                AddLink(blocks, context, frame, frame.Parent);
            }

            foreach (var (_, observer, basis) in wanted)
            {
                AddComposition(blocks, context, frame, observer, basis);
            }
        }
    }

    private static void AddLink(List<Block> blocks, DerivationContext context, FrameSymbol frame, FrameSymbol parent)
    {
        var motion = context.Geometry.MotionOf(frame);
        var rows = new List<string>();
        if (frame.IsSpin)
        {
            blocks.Add(new Paragraph(new Words("This frame is known only by its angular velocity (a spin), written in its own basis; it has no rotation matrix, so its basis can be related only to the frames below it.")));
        }
        else if (motion.Orientation is { } orientation)
        {
            rows.Add($"R_{{{Tex.Name(frame)}}} &= {Tex.Matrix(orientation)}");
        }

        rows.Add($"{Tex.In(Tex.Omega(frame, parent), frame)} &= {Tex.Column(motion.AngularVelocity)}");
        rows.Add($"{Tex.In(Tex.Alpha(frame, parent), frame)} &= {Tex.Column(motion.AngularAcceleration)}");
        if (motion.Origin is { } origin)
        {
            rows.Add($"{Tex.In($"\\mathbf{{r}}_{{O_{{{Tex.Name(frame)}}}/O_{{{Tex.Name(parent)}}}}}", parent)} &= {Tex.Column(origin)}");
        }

        blocks.Add(new Equations(rows));
    }

    private static void AddComposition(List<Block> blocks, DerivationContext context, FrameSymbol frame, FrameSymbol observer, FrameSymbol basis)
    {
        var path = FramePath.Between(observer, frame);
        if (path.Count == 0)
        {
            return;
        }

        if (path.Count == 1 && !path[0].IsUp && ReferenceEquals(basis, frame))
        {
            blocks.Add(new Paragraph(new Words($"Seen from {observer.Name}, its parent, in its own basis: the angular velocity and acceleration are those above.")));
            return;
        }

        var chain = context.Geometry.Compose(observer, frame, basis);
        if (chain is null)
        {
            blocks.Add(new Paragraph(new Words($"Seen from {observer.Name}: the links on the way cannot all be written in the basis of {basis.Name} (a spin frame is in the way), so the composition is not shown here.")));
            return;
        }

        blocks.Add(new Paragraph(new Words($"Seen from {observer.Name}, written in the basis of {basis.Name}, link by link along {string.Join(" > ", new[] { observer.Name }.Concat(path.Select(s => s.To.Name)))}:")));
        var rows = new List<string>();
        FrameSymbol? previous = null;
        foreach (var step in chain.Steps)
        {
            var to = step.Step.To;
            var from = step.Step.From;
            var linkOmega = Tex.Omega(to, from);
            var linkAlpha = Tex.Alpha(to, from);
            if (step.Step.IsUp)
            {
                rows.Add($"{Tex.In(linkOmega, basis)} &= -{Tex.In(Tex.Omega(from, to), basis)} = {Tex.Column(step.LinkOmega)}");
            }

            if (previous is null)
            {
                rows.Add($"{Tex.In(Tex.Omega(to, observer), basis)} &= {Tex.Column(step.Omega)}");
                rows.Add($"{Tex.In(Tex.Alpha(to, observer), basis)} &= {Tex.Column(step.Alpha)}");
            }
            else
            {
                rows.Add($"{Tex.In(Tex.Omega(to, observer), basis)} &= {Tex.Omega(from, observer)} + {linkOmega}");
                rows.Add($"&= {Tex.Column(step.Omega)}");
                rows.Add($"{Tex.Omega(from, observer)} \\times {linkOmega} &= {Tex.Column(step.Cross)}");
                rows.Add($"{Tex.In(Tex.Alpha(to, observer), basis)} &= {Tex.Alpha(from, observer)} + {linkAlpha} + {Tex.Omega(from, observer)} \\times {linkOmega}");
                rows.Add($"&= {Tex.Column(step.Alpha)}");
            }

            previous = to;
        }

        blocks.Add(new Equations(rows));
    }

    /// <summary>(frame, observer, basis) for every report's moving frame or subject frame, first use first.</summary>
    private static List<(FrameSymbol Frame, FrameSymbol Observer, FrameSymbol Basis)> CompositionsUsed(IEnumerable<ReportSymbol> reports)
    {
        var list = new List<(FrameSymbol Frame, FrameSymbol Observer, FrameSymbol Basis)>();
        foreach (var report in reports)
        {
            var frame = report.Kind == ReportKind.Point ? report.Via ?? report.SubjectFrame : report.SubjectFrame;
            var entry = (frame, report.Observer, report.Basis);
            if (!list.Exists(e => ReferenceEquals(e.Frame, entry.frame) && ReferenceEquals(e.Observer, entry.Observer) && ReferenceEquals(e.Basis, entry.Basis)))
            {
                list.Add(entry);
            }
        }

        return list;
    }
}
