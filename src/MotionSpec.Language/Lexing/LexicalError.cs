using MotionSpec.Language.Text;

namespace MotionSpec.Language.Lexing;

/// <summary>A problem the tokenizer found; tokenizing goes on after it so that every error is reported.</summary>
internal readonly record struct LexicalError(string Code, TextSpan Span, string Message);
