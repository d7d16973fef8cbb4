using System.Globalization;
using MotionSpec.Derivation.Document;
using MotionSpec.Kinematics;
using MotionSpec.Language.Binding;
using MotionSpec.Symbolic;

namespace MotionSpec.Derivation.Sections;

/// <summary>The spec as the derivation reads it: frame tree, params (as written and in SI), coords, points and reports.</summary>
internal static class SpecSection
{
    public static void Add(List<Block> blocks, DerivationContext context)
    {
        var spec = context.Model.Spec;
        var source = spec.Source;
        blocks.Add(new Heading(1, "The spec"));

        blocks.Add(new Heading(2, "Frame tree"));
        blocks.Add(new Paragraph(new Words("Each frame with its parent, its orientation and its origin as the spec writes them (origins relative to the parent's origin, in the parent's basis).")));
        blocks.Add(new Table(
            [[new Words("frame")], [new Words("parent")], [new Words("path from the root")], [new Words("orientation")], [new Words("origin")]],
            spec.Frames.Select(f => (IReadOnlyList<IReadOnlyList<Inline>>)
            [
                [new Code(f.Name)],
                f.Parent is null ? [new Words("(root)")] : [new Code(f.Parent.Name)],
                [new Words(PathFromRoot(f))],
                Orientation(f, source),
                f.OriginSpan is { } origin ? [new Code(source.GetText(origin))] : [new Words("at the parent's origin")],
            ]).ToArray()));

        blocks.Add(new Heading(2, "Params"));
        if (spec.Parameters.Count == 0)
        {
            blocks.Add(new Paragraph(new Words("The spec declares no params.")));
        }
        else
        {
            blocks.Add(new Paragraph(new Words("Params stay symbols in the closed forms. A derived param is recomputed from the others; its definition in SI is shown.")));
            blocks.Add(new Table(
                [[new Words("param")], [new Words("as written")], [new Words("value in SI")], [new Words("definition in SI")]],
                context.Model.Parameters.Select(p => (IReadOnlyList<IReadOnlyList<Inline>>)
                [
                    [new Formula(Tex.Symbol(p.Symbol)), new Words(" ("), new Code(p.Param.Name), new Words(")")],
                    [new Code(source.GetText(p.Param.Definition.Span))],
                    [new Words(ValueInSi(p.Param.Value, p.Param.Dimension))],
                    p.Param.IsDerived ? [new Formula(LatexPrinter.Print(p.Definition))] : [new Words("independent")],
                ]).ToArray()));
        }

        blocks.Add(new Heading(2, "Generalized coordinates"));
        if (spec.Coords.Count == 0)
        {
            blocks.Add(new Paragraph(new Words("The spec declares no coords: the motion is a function of time alone.")));
        }
        else
        {
            blocks.Add(new Table(
                [[new Words("coord")], [new Words("kind")], [new Words("value, rate, acceleration")], [new Words("SI units")]],
                spec.Coords.Select(c => (IReadOnlyList<IReadOnlyList<Inline>>)
                [
                    [new Code(c.Name)],
                    [new Words(c.Kind == CoordKind.Angle ? "angle" : "length")],
                    [new Formula(string.Join(", ", Enumerable.Range(0, 3).Select(order => Tex.Symbol(KinematicModel.SymbolOf(c, order)))))],
                    [new Words(c.Kind == CoordKind.Angle ? "rad, rad/s, rad/s^2" : "m, m/s, m/s^2")],
                ]).ToArray()));
        }

        if (spec.Points.Count > 0)
        {
            blocks.Add(new Heading(2, "Points"));
            blocks.Add(new Table(
                [[new Words("point")], [new Words("frame")], [new Words("position in its frame, as written")]],
                spec.Points.Select(p => (IReadOnlyList<IReadOnlyList<Inline>>)
                [
                    [new Code(p.Name)], [new Code(p.Frame.Name)], [new Code(source.GetText(p.Position.Span))],
                ]).ToArray()));
        }

        blocks.Add(new Heading(2, "Reports"));
        blocks.Add(new Table(
            [[new Words("report")], [new Words("motion of")], [new Words("seen from")], [new Words("moving frame")], [new Words("basis")]],
            context.Reports.Select(m => m.Report).Select(r => (IReadOnlyList<IReadOnlyList<Inline>>)
            [
                [new Code(r.Name)],
                [new Words(r.Kind == ReportKind.Point ? "point " : "frame "), new Code(r.SubjectName)],
                [new Code(r.Observer.Name)],
                r.Via is null ? [new Words("(frame report)")] : [new Code(r.Via.Name)],
                [new Code(r.Basis.Name)],
            ]).ToArray()));
    }

    internal static string ValueInSi(double value, Dimension dimension)
    {
        var number = value.ToString("R", CultureInfo.InvariantCulture);
        if (dimension.IsFree)
        {
            return number + " (no unit written)";
        }

        var unit = dimension.SiUnit();
        return unit == "1" ? number + " rad (or a ratio)" : number + " " + unit;
    }

    private static string PathFromRoot(Language.Binding.Symbols.FrameSymbol frame)
    {
        var names = new List<string>();
        for (var f = frame; f is not null; f = f.Parent)
        {
            names.Add(f.Name);
        }

        names.Reverse();
        return string.Join(" > ", names);
    }

    private static IReadOnlyList<Inline> Orientation(Language.Binding.Symbols.FrameSymbol frame, Language.Text.SourceText source)
    {
        if (frame.Parent is null)
        {
            return [new Words("(reference)")];
        }

        if (frame.SpinSpan is { } spin)
        {
            return [new Code(source.GetText(spin)), new Words(" (known by its angular velocity only)")];
        }

        if (frame.Rotations.Count == 0)
        {
            return [new Words("the parent's")];
        }

        return [new Code(string.Join("; ", frame.Rotations.Select(r => source.GetText(r.Span))))];
    }
}
