using MotionSpec.Derivation.Document;
using MotionSpec.Derivation.Naming;
using MotionSpec.Derivation.Rendering;
using MotionSpec.Derivation.Sections;
using MotionSpec.Derivation.Text;
using MotionSpec.Kinematics;

namespace MotionSpec.Derivation;

/// <summary>
/// The derivation pass: names the recurring subexpressions of the reports' closed forms, then writes either
/// the plain closed forms or a document (notation, spec, frames, named intermediates, reports, caution) as
/// Markdown or LaTeX. Pure: the same model gives the same text.
/// </summary>
public static class DerivationWriter
{
    /// <summary>
    /// Writes the derivation of a checked model; <paramref name="displayName"/> is the spec's title or file
    /// name. <paramref name="reportNames"/>, when given, limits it to those reports (kept in file order);
    /// every name must be a report of the model (see <see cref="UnknownReports"/>).
    /// </summary>
    public static string Write(KinematicModel model, string displayName, DerivationFormat format, IReadOnlyCollection<string>? reportNames = null)
    {
        ArgumentNullException.ThrowIfNull(model);
        ArgumentNullException.ThrowIfNull(displayName);
        var reports = reportNames is null || reportNames.Count == 0
            ? model.Reports
            : model.Reports.Where(r => reportNames.Contains(r.Name, StringComparer.Ordinal)).ToList();
        var named = NamedIntermediates.Find(ClosedFormTextWriter.Outputs(reports), new SpecNames(model.Spec));
        if (format == DerivationFormat.Text)
        {
            return ClosedFormTextWriter.Write(model, reports, displayName, named);
        }

        var document = Build(new DerivationContext(model, reports, displayName, named));
        return format == DerivationFormat.Latex ? LatexRenderer.Render(document) : MarkdownRenderer.Render(document);
    }

    /// <summary>The names in <paramref name="reportNames"/> that are not reports of the model, in the order given.</summary>
    public static IReadOnlyList<string> UnknownReports(KinematicModel model, IEnumerable<string> reportNames)
    {
        ArgumentNullException.ThrowIfNull(model);
        return reportNames.Where(n => !model.Reports.Any(r => string.Equals(r.Name, n, StringComparison.Ordinal))).ToList();
    }

    private static DerivationDocument Build(DerivationContext context)
    {
        var blocks = new List<Block>();
        NotationSection.Add(blocks);
        SpecSection.Add(blocks, context);
        FramesSection.Add(blocks, context);
        IntermediatesSection.Add(blocks, context);
        ReportsSection.Add(blocks, context);
        blocks.Add(new Heading(1, "Caution"));
        blocks.Add(new Paragraph(new Words(SafetyCaution.Text)));
        return new DerivationDocument("Derivation of " + context.DisplayName, blocks);
    }
}
