using MotionSpec.Derivation.Document;
using MotionSpec.Symbolic;

namespace MotionSpec.Derivation.Sections;

/// <summary>The named intermediates, each defined once, before the reports that use them.</summary>
internal static class IntermediatesSection
{
    public static void Add(List<Block> blocks, DerivationContext context)
    {
        if (context.Named.Temporaries.Count == 0)
        {
            return;
        }

        blocks.Add(new Heading(1, "Named intermediates"));
        blocks.Add(new Paragraph(new Words("Expressions that recur in the closed forms of the reports, named once so that long chains stay readable. Each uses only inputs and earlier intermediates.")));
        blocks.Add(new Equations(context.Named.Temporaries.Select(t => $"{LatexPrinter.Print(t.Name)} &= {Tex.Cell(t.Value)}").ToArray()));
    }
}
