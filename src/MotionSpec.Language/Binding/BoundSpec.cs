using MotionSpec.Language.Binding.Symbols;
using MotionSpec.Language.Text;

namespace MotionSpec.Language.Binding;

/// <summary>
/// A spec after binding: every name resolved, the frame tree built, units checked and converted to SI,
/// report defaults filled. Later stages read only this.
/// </summary>
public sealed class BoundSpec(
    SourceText source,
    string? title,
    IReadOnlyList<ParamSymbol> parameters,
    IReadOnlyList<CoordSymbol> coords,
    IReadOnlyList<LetSymbol> lets,
    IReadOnlyList<FrameSymbol> frames,
    IReadOnlyList<PointSymbol> points,
    IReadOnlyList<ReportSymbol> reports)
{
    /// <summary>The text the spec was bound from.</summary>
    public SourceText Source { get; } = source;

    /// <summary>The title, when one is written.</summary>
    public string? Title { get; } = title;

    /// <summary>Params in file order.</summary>
    public IReadOnlyList<ParamSymbol> Parameters { get; } = parameters;

    /// <summary>Coords in file order.</summary>
    public IReadOnlyList<CoordSymbol> Coords { get; } = coords;

    /// <summary>Lets in file order.</summary>
    public IReadOnlyList<LetSymbol> Lets { get; } = lets;

    /// <summary>Frames in file order (a parent always comes before its children).</summary>
    public IReadOnlyList<FrameSymbol> Frames { get; } = frames;

    /// <summary>Points in file order.</summary>
    public IReadOnlyList<PointSymbol> Points { get; } = points;

    /// <summary>Reports in file order.</summary>
    public IReadOnlyList<ReportSymbol> Reports { get; } = reports;
}
