using MotionSpec.Language.Text;

namespace MotionSpec.Language.Syntax;

/// <summary>Any piece of a parsed spec; every node knows where it is written.</summary>
internal abstract class SyntaxNode(TextSpan span)
{
    /// <summary>The characters this node covers.</summary>
    public TextSpan Span { get; } = span;
}
