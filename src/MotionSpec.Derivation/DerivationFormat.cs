namespace MotionSpec.Derivation;

/// <summary>The output formats of <c>motionspec derive</c>.</summary>
public enum DerivationFormat
{
    /// <summary>A Markdown document with TeX math (the default).</summary>
    Markdown,

    /// <summary>A standalone LaTeX document (article class, amsmath).</summary>
    Latex,

    /// <summary>Plain closed forms in the spec language's own expression syntax.</summary>
    Text,
}
