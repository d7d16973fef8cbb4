namespace MotionSpec.CSharp.Analysis;

/// <summary>How much arithmetic one generated method does, as the compiler sees it.</summary>
/// <param name="Method">The method's name.</param>
/// <param name="Operations">Arithmetic operators (binary and unary minus) plus calls to Math or MathF.</param>
/// <param name="MathCalls">Of those, the calls to Math or MathF.</param>
public sealed record MethodStatistics(string Method, int Operations, int MathCalls);
