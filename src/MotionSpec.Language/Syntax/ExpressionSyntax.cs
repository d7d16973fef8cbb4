using MotionSpec.Language.Text;

namespace MotionSpec.Language.Syntax;

/// <summary>A scalar or vector expression as written, such as <c>w * t + psi</c>.</summary>
internal abstract class ExpressionSyntax(TextSpan span) : SyntaxNode(span);
