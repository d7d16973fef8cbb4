namespace MotionSpec.CSharp;

/// <summary>
/// The MOT51xx codes of C# emission and of the check that follows it. Warnings are renames a reader of the
/// generated file must know about; errors on generated code are defects of MotionSpec, never of the spec.
/// </summary>
public static class CSharpDiagnosticCodes
{
    /// <summary>Warning: a spec name was changed to keep the C# valid (keyword clash or collision).</summary>
    public const string Renamed = "MOT5101";

    /// <summary>Error: the class name given on the command line is not a C# identifier.</summary>
    public const string InvalidClassName = "MOT5102";

    /// <summary>Error: the namespace given on the command line is not a dotted C# name.</summary>
    public const string InvalidNamespace = "MOT5103";

    /// <summary>Error: a param's SI value does not fit the number type chosen (float, say).</summary>
    public const string OutOfRange = "MOT5104";

    /// <summary>Error (a defect of ours): the C# compiler reported a diagnostic on the generated file.</summary>
    public const string CompilerRejected = "MOT5110";

    /// <summary>Error (a defect of ours): the generated code allocates on the heap or boxes.</summary>
    public const string HeapAllocation = "MOT5111";

    /// <summary>Error (a defect of ours): the generated code calls something other than System.Math or System.MathF.</summary>
    public const string ForbiddenCall = "MOT5112";

    /// <summary>Error (a defect of ours): the generated code loops or jumps.</summary>
    public const string LoopOrJump = "MOT5113";

    /// <summary>Error (a defect of ours): the generated code can call itself.</summary>
    public const string Recursion = "MOT5114";

    /// <summary>Error (a defect of ours): another construct an evaluator must not contain (strings, exceptions, closures...).</summary>
    public const string ForbiddenConstruct = "MOT5115";
}
