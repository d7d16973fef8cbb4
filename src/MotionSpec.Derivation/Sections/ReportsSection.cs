using MotionSpec.Derivation.Checks;
using MotionSpec.Derivation.Document;
using MotionSpec.Kinematics;
using MotionSpec.Language.Binding;
using MotionSpec.Language.Binding.Symbols;

namespace MotionSpec.Derivation.Sections;

/// <summary>
/// Each report: the position, the relative velocity, the five terms with their names, defining formulas and
/// closed forms in the report's basis, their sum, and what the sum was checked against.
/// </summary>
internal static class ReportsSection
{
    public static void Add(List<Block> blocks, DerivationContext context)
    {
        blocks.Add(new Heading(1, "Reports"));
        if (context.Reports.Count == 0)
        {
            blocks.Add(new Paragraph(new Words("The spec asks for no reports, so there is nothing to derive.")));
        }

        for (var index = 0; index < context.Reports.Count; index++)
        {
            var report = context.Reports[index].Report;
            var checks = ReportChecks.Run(context.Model, context.Geometry, context.Reports[index]);
            if (report.Kind == ReportKind.Point)
            {
                AddPoint(blocks, context, index, report, checks);
            }
            else
            {
                AddFrame(blocks, context, index, report, checks);
            }
        }
    }

    private static void AddPoint(List<Block> blocks, DerivationContext context, int index, ReportSymbol report, ReportChecks checks)
    {
        var a = report.Observer;
        var b = report.Via ?? report.SubjectFrame;
        var c = report.Basis;
        blocks.Add(new Heading(2, $"Report {report.Name}: point {report.SubjectName} seen from {a.Name}"));
        blocks.Add(new Paragraph(
            new Words($"Moving frame {b.Name} (the five terms are taken with respect to it); every vector is written in the basis of {c.Name}. Position and velocity of the point as seen in {a.Name}:")));
        blocks.Add(new Equations(
        [
            $"{Tex.In("\\mathbf{p}", c)} &= {Tex.Column(context.Printed(index, Quantity.Position))}",
            $"{Tex.In("\\mathbf{v}", c)} &= {Tex.In(Tex.DerivativeIn(a, "\\mathbf{p}"), c)}",
            $"&= {Tex.Column(context.Printed(index, Quantity.Velocity))}",
        ]));

        var rows = new List<string>();
        var tooLong = (checks.RelativePosition is { } whole && TooLongToPrint(whole))
            || (checks.RelativeVelocity is { } wholeVelocity && TooLongToPrint(wholeVelocity));
        if (tooLong)
        {
            // Built here without named intermediates, these grow with every link of a long chain (doubling per
            // link as printed); a formula of millions of terms helps no reviewer and would take hours to write.
            blocks.Add(new Paragraph(new Words(
                $"The point's position relative to the moving frame's origin and its velocity as seen in {b.Name} are too long to print here (more than {MaxPrintedNodes.ToString(System.Globalization.CultureInfo.InvariantCulture)} symbols in a component); the checks below use them as computed.")));
        }

        if (!tooLong && checks.RelativePosition is { } r)
        {
            rows.Add($"{Tex.In("\\mathbf{r}", c)} &= {Tex.In($"\\mathbf{{p}} - \\mathbf{{r}}_{{O_{{{Tex.Name(b)}}}/O_{{{Tex.Name(a)}}}}}", c)}");
            rows.Add($"&= {Tex.Column(r)}");
        }

        if (!tooLong && checks.RelativeVelocity is { } vRel)
        {
            rows.Add($"{Tex.In("\\mathbf{v}_{\\mathrm{rel}}", c)} &= {Tex.In(Tex.DerivativeIn(b, "\\mathbf{r}"), c)}");
            rows.Add($"&= {Tex.Column(vRel)}");
        }

        if (checks.Moving is { } moving)
        {
            rows.Add($"{Tex.In(Tex.Omega(b, a), c)} &= {Tex.Column(moving.Omega)}");
            rows.Add($"{Tex.In(Tex.Alpha(b, a), c)} &= {Tex.Column(moving.Alpha)}");
        }

        if (rows.Count > 0)
        {
            blocks.Add(new Paragraph(new Words($"The point relative to the moving frame's origin, its velocity as seen in {b.Name}, and the moving frame's rotation relative to {a.Name} (composed in the section on frames):")));
            blocks.Add(new Equations(rows));
        }

        blocks.Add(new Paragraph(new Words($"The five terms of the acceleration as seen in {a.Name}:")));
        var w = Tex.Omega(b, a);
        foreach (var term in QuantityInfo.Terms)
        {
            var (symbol, definition) = Definition(term, w, Tex.Alpha(b, a), a, b);
            blocks.Add(new Paragraph(
                new Words(Capitalized(QuantityInfo.TradeName(term)) + " ("),
                new Code(QuantityInfo.Key(term)),
                new Words("): "),
                new Formula($"{symbol} = {definition}")));
            blocks.Add(new Equations([$"{Tex.In(symbol, c)} &= {Tex.Column(context.Printed(index, term))}"]));
        }

        blocks.Add(new Paragraph(new Words("Their sum, the acceleration of the point as seen in " + a.Name + ":")));
        blocks.Add(new Equations(
        [
            $"{Tex.In("\\mathbf{a}", c)} &= {Tex.In("\\mathbf{a}_{\\mathrm{rel}} + \\mathbf{a}_{\\mathrm{cp}} + \\mathbf{a}_{\\alpha} + \\mathbf{a}_{\\mathrm{Cor}} + \\mathbf{a}_{O}", c)}",
            $"&= {Tex.Column(context.Printed(index, Quantity.Acceleration))}",
        ]));
        blocks.Add(new Items(
        [
            [new Words($"Sum of the five terms against the position differentiated twice as seen in {a.Name} (and the velocity against it differentiated once): " + checks.SumAgainstDirect.Describe() + ".")],
            [new Words("Stated acceleration against the sum of the five terms: " + checks.TotalAgainstSum.Describe() + ".")],
            [new Words("Each term against its defining formula, evaluated from the position, relative velocity and rotation shown above: " + checks.TermsAgainstDefinitions.Describe() + ".")],
        ]));
    }

    /// <summary>Components larger than this (as printed, without sharing) are described instead of printed.</summary>
    internal const int MaxPrintedNodes = 20_000;

    private static bool TooLongToPrint(Vector3Expr v) => v.Components.Any(e => MotionSpec.Symbolic.ExprMetrics.TreeNodeCount(e) > MaxPrintedNodes);

    private static void AddFrame(List<Block> blocks, DerivationContext context, int index, ReportSymbol report, ReportChecks checks)
    {
        var a = report.Observer;
        var f = report.SubjectFrame;
        var c = report.Basis;
        blocks.Add(new Heading(2, $"Report {report.Name}: frame {f.Name} seen from {a.Name}"));
        blocks.Add(new Paragraph(new Words($"Every vector is written in the basis of {c.Name}.")));
        var origin = $"\\mathbf{{r}}_{{O_{{{Tex.Name(f)}}}/O_{{{Tex.Name(a)}}}}}";
        blocks.Add(new Equations(
        [
            $"{Tex.In(Tex.Omega(f, a), c)} &= {Tex.Column(context.Printed(index, Quantity.AngularVelocity))}",
            $"{Tex.In(Tex.Alpha(f, a), c)} &= {Tex.Column(context.Printed(index, Quantity.AngularAcceleration))}",
            $"{Tex.In(origin, c)} &= {Tex.Column(context.Printed(index, Quantity.OriginPosition))}",
            $"{Tex.In(Tex.DerivativeIn(a, origin), c)} &= {Tex.Column(context.Printed(index, Quantity.OriginVelocity))}",
            $"{Tex.In(Tex.DerivativeIn(a, origin, 2), c)} &= {Tex.Column(context.Printed(index, Quantity.OriginAcceleration))}",
        ]));
        blocks.Add(new Items(
        [
            [new Words("Angular velocity and acceleration against their composition along the tree: " + checks.TotalAgainstSum.Describe() + ".")],
            [new Words($"Origin velocity and acceleration against the origin's position differentiated as seen in {a.Name}: " + checks.SumAgainstDirect.Describe() + ".")],
        ]));
    }

    private static (string Symbol, string Definition) Definition(Quantity term, string omega, string alpha, FrameSymbol observer, FrameSymbol moving) => term switch
    {
        Quantity.Relative => ("\\mathbf{a}_{\\mathrm{rel}}", Tex.DerivativeIn(moving, "\\mathbf{r}", 2)),
        Quantity.Centripetal => ("\\mathbf{a}_{\\mathrm{cp}}", $"{omega} \\times \\left({omega} \\times \\mathbf{{r}}\\right)"),
        Quantity.Angular => ("\\mathbf{a}_{\\alpha}", $"{alpha} \\times \\mathbf{{r}}"),
        Quantity.Coriolis => ("\\mathbf{a}_{\\mathrm{Cor}}", $"2\\, {omega} \\times \\mathbf{{v}}_{{\\mathrm{{rel}}}}"),
        _ => ("\\mathbf{a}_{O}", Tex.DerivativeIn(observer, $"\\mathbf{{r}}_{{O_{{{Tex.Name(moving)}}}/O_{{{Tex.Name(observer)}}}}}", 2)),
    };

    private static string Capitalized(string s) => s.Length == 0 ? s : char.ToUpperInvariant(s[0]) + s[1..];
}
