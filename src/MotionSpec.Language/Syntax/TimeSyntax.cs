using MotionSpec.Language.Text;

namespace MotionSpec.Language.Syntax;

/// <summary><c>t</c>: time (a mark after it, <c>t'</c>, is parsed so that the binder can say marks go on coords).</summary>
internal sealed class TimeSyntax(TextSpan span, int marks = 0) : ExpressionSyntax(span)
{
    /// <summary>Marks written after <c>t</c> (an error).</summary>
    public int Marks { get; } = marks;

    /// <inheritdoc/>
    public override string ToString() => "t" + new string('\'', Marks);
}
