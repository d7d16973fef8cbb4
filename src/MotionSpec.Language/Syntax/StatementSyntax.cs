using MotionSpec.Language.Text;

namespace MotionSpec.Language.Syntax;

/// <summary>A top-level statement such as <c>param L = 18 m</c>.</summary>
internal abstract class StatementSyntax(TextSpan span) : SyntaxNode(span);
