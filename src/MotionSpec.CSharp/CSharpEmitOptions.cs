namespace MotionSpec.CSharp;

/// <summary>How the evaluator is written: its namespace, its class and its number type.</summary>
/// <param name="Namespace">A dotted C# name; each part that is a C# keyword is escaped.</param>
/// <param name="ClassName">The class; null derives it from the file name.</param>
/// <param name="UseFloat">Write <c>float</c> and <c>MathF</c> instead of <c>double</c> and <c>Math</c>.</param>
public sealed record CSharpEmitOptions(string Namespace = CSharpEmitOptions.DefaultNamespace, string? ClassName = null, bool UseFloat = false)
{
    /// <summary>The namespace used when none is given.</summary>
    public const string DefaultNamespace = "MotionSpec.Generated";
}
