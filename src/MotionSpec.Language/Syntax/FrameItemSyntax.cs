using MotionSpec.Language.Text;

namespace MotionSpec.Language.Syntax;

/// <summary>A statement inside a frame's block: <c>rotate</c>, <c>origin</c> or <c>spin</c>.</summary>
internal abstract class FrameItemSyntax(TextSpan span) : SyntaxNode(span);
