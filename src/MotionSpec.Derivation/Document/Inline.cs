namespace MotionSpec.Derivation.Document;

/// <summary>A run of a paragraph or table cell: plain words, a formula, or source text shown as code.</summary>
internal abstract record Inline;

/// <summary>Plain words, escaped by each renderer.</summary>
internal sealed record Words(string Text) : Inline;

/// <summary>A formula in LaTeX math (no delimiters); both renderers pass it through unchanged.</summary>
internal sealed record Formula(string Tex) : Inline;

/// <summary>Text quoted from the spec, shown in a fixed-width font.</summary>
internal sealed record Code(string Text) : Inline;
