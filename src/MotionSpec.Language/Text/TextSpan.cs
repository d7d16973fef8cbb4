namespace MotionSpec.Language.Text;

/// <summary>A range of characters in a <see cref="SourceText"/>: start offset and length (end exclusive).</summary>
public readonly record struct TextSpan(int Start, int Length)
{
    /// <summary>Offset just past the last character.</summary>
    public int End => Start + Length;

    /// <summary>The span from the start of <paramref name="first"/> to the end of <paramref name="last"/>.</summary>
    public static TextSpan Cover(TextSpan first, TextSpan last) => new(first.Start, Math.Max(first.End, last.End) - first.Start);
}
