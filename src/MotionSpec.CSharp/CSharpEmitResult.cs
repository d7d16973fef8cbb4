using MotionSpec.Language.Diagnostics;

namespace MotionSpec.CSharp;

/// <summary>The generated file (absent when an error stopped emission) and the warnings or errors emission found.</summary>
public sealed class CSharpEmitResult
{
    internal CSharpEmitResult(string? code, string className, string @namespace, IReadOnlyList<EmittedMethod> methods,
        IReadOnlyList<Diagnostic> diagnostics)
    {
        Code = code;
        ClassName = className;
        Namespace = @namespace;
        Methods = methods;
        Diagnostics = diagnostics;
    }

    /// <summary>The C# source, or null when emission failed.</summary>
    public string? Code { get; }

    /// <summary>The class as written in the file (a leading <c>@</c> when escaped).</summary>
    public string ClassName { get; }

    /// <summary>The namespace as written in the file.</summary>
    public string Namespace { get; }

    /// <summary>One entry per report, in file order.</summary>
    public IReadOnlyList<EmittedMethod> Methods { get; }

    /// <summary>Renames (warnings) and reasons emission could not proceed (errors).</summary>
    public IReadOnlyList<Diagnostic> Diagnostics { get; }

    /// <summary>True when a file was produced.</summary>
    public bool Succeeded => Code is not null;
}

/// <summary>The method written for one report.</summary>
/// <param name="Report">The report's name in the spec.</param>
/// <param name="Method">The method's name in C#.</param>
/// <param name="IsPoint">True for a point report (returns PointMotion), false for a frame report (FrameMotion).</param>
/// <param name="Temporaries">How many shared intermediate values the method computes.</param>
public sealed record EmittedMethod(string Report, string Method, bool IsPoint, int Temporaries);
