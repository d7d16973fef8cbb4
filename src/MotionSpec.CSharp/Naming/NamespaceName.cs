using MotionSpec.Language.Diagnostics;

namespace MotionSpec.CSharp.Naming;

/// <summary>Checks a namespace such as <c>Robot.Arm</c> and writes it for C#, escaping keyword parts.</summary>
internal static class NamespaceName
{
    public static string? Validate(string? name, DiagnosticBag diagnostics)
    {
        if (!CSharpIdentifier.IsDottedName(name))
        {
            diagnostics.Error(CSharpDiagnosticCodes.InvalidNamespace, default,
                $"the namespace '{Text.CommentText.OneLine(name)}' is not a dotted C# name such as Robot.Arm");
            return null;
        }

        return string.Join(".", name!.Split('.').Select(CSharpIdentifier.Escape));
    }
}
