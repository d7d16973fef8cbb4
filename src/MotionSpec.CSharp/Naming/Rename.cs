namespace MotionSpec.CSharp.Naming;

/// <summary>One spec name that reaches the C# file under another name, and why.</summary>
/// <param name="What">What the name belongs to, in words: "param", "coord", "report method", "class".</param>
/// <param name="SpecName">The name as the spec (or the command line) writes it.</param>
/// <param name="CSharpName">The name in the generated file (without any <c>@</c>).</param>
/// <param name="Reason">What it would have collided with.</param>
/// <param name="Index">Position of the renamed item in its own list (params, coords or reports); -1 for the class.</param>
public sealed record Rename(string What, string SpecName, string CSharpName, string Reason, int Index);
