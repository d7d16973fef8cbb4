using MotionSpec.Derivation.Document;
using MotionSpec.Derivation.Naming;
using MotionSpec.Derivation.Rendering;
using MotionSpec.Derivation.Sections;
using MotionSpec.Derivation.Text;
using MotionSpec.Kinematics;

namespace MotionSpec.Derivation;

/// <summary>
/// The derivation pass: names the recurring subexpressions of every report's closed forms, then writes either
/// the plain closed forms or a document (notation, spec, frames, named intermediates, reports, caution) as
/// Markdown or LaTeX. Pure: the same model gives the same text.
/// </summary>
public static class DerivationWriter
{
    /// <summary>Writes the derivation of a checked model; <paramref name="displayName"/> is the spec's title or file name.</summary>
    public static string Write(KinematicModel model, string displayName, DerivationFormat format)
    {
        ArgumentNullException.ThrowIfNull(model);
        ArgumentNullException.ThrowIfNull(displayName);
        var named = NamedIntermediates.Find(ClosedFormTextWriter.Outputs(model), new SpecNames(model.Spec));
        if (format == DerivationFormat.Text)
        {
            return ClosedFormTextWriter.Write(model, displayName, named);
        }

        var document = Build(new DerivationContext(model, displayName, named));
        return format == DerivationFormat.Latex ? LatexRenderer.Render(document) : MarkdownRenderer.Render(document);
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
