using MotionSpec.Language.Text;

namespace MotionSpec.Language.Binding.Symbols;

/// <summary>
/// <c>report tip in quay via trolley basis boom as tipLoad</c>: the motion of a point or frame seen from an
/// observer, with defaults filled (via = the point's frame, basis = the observer, name as the language says).
/// </summary>
public sealed class ReportSymbol(
    string name,
    TextSpan nameSpan,
    TextSpan statementSpan,
    int index,
    ReportKind kind,
    PointSymbol? point,
    FrameSymbol subjectFrame,
    FrameSymbol observer,
    FrameSymbol? via,
    FrameSymbol basis)
    : Symbol(name, nameSpan, statementSpan)
{
    /// <summary>Position among the reports, in file order.</summary>
    public int Index { get; } = index;

    /// <summary>Point or frame report.</summary>
    public ReportKind Kind { get; } = kind;

    /// <summary>The point followed, for a point report.</summary>
    public PointSymbol? Point { get; } = point;

    /// <summary>The frame followed for a frame report; the point's own frame for a point report.</summary>
    public FrameSymbol SubjectFrame { get; } = subjectFrame;

    /// <summary>The frame the motion is seen from.</summary>
    public FrameSymbol Observer { get; } = observer;

    /// <summary>The moving frame of the five terms (point reports only).</summary>
    public FrameSymbol? Via { get; } = via;

    /// <summary>The basis every vector of the report is written in.</summary>
    public FrameSymbol Basis { get; } = basis;

    /// <summary>The name of the subject as written (a point's or frame's name).</summary>
    public string SubjectName => Point?.Name ?? SubjectFrame.Name;

    /// <inheritdoc/>
    public override string KindName => "report";
}
