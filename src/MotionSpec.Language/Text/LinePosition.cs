namespace MotionSpec.Language.Text;

/// <summary>A line and column, both counted from 1; a column counts Unicode scalar values (a tab is one).</summary>
public readonly record struct LinePosition(int Line, int Column)
{
    /// <inheritdoc/>
    public override string ToString() => FormattableString.Invariant($"{Line},{Column}");
}
