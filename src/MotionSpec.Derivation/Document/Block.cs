namespace MotionSpec.Derivation.Document;

/// <summary>A piece of a derivation document, independent of the output format.</summary>
internal abstract record Block;

/// <summary>A heading; level 1 is a section, 2 a subsection, 3 a subsubsection.</summary>
internal sealed record Heading(int Level, string Text) : Block;

/// <summary>A paragraph of runs.</summary>
internal sealed record Paragraph(IReadOnlyList<Inline> Runs) : Block
{
    public Paragraph(params Inline[] runs)
        : this((IReadOnlyList<Inline>)runs)
    {
    }
}

/// <summary>Displayed equations, one per row, each row written as <c>lhs &amp;= rhs</c> for alignment.</summary>
internal sealed record Equations(IReadOnlyList<string> Rows) : Block;

/// <summary>A table with a header row; every cell is a list of runs.</summary>
internal sealed record Table(IReadOnlyList<IReadOnlyList<Inline>> Header, IReadOnlyList<IReadOnlyList<IReadOnlyList<Inline>>> Rows) : Block;

/// <summary>A flat list of items.</summary>
internal sealed record Items(IReadOnlyList<IReadOnlyList<Inline>> Entries) : Block;

/// <summary>A whole derivation: title and blocks.</summary>
internal sealed record DerivationDocument(string Title, IReadOnlyList<Block> Blocks);
