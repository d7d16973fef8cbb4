using System.Collections.Concurrent;
using Microsoft.CodeAnalysis;

namespace MotionSpec.Generator;

/// <summary>
/// Descriptors for spec diagnostics, one family per code range (MOT1 syntax, MOT2 names and frames, MOT3
/// units, MOT4 kinematics, MOT5 output). Each code gets its own descriptor of its family, so the build shows
/// the spec's own code (MOT2203, say) and a project can raise or silence one code in .editorconfig.
/// </summary>
internal static class SpecDiagnosticDescriptors
{
    private static readonly ConcurrentDictionary<(string, bool), DiagnosticDescriptor> Cache = new();

    public static DiagnosticDescriptor For(string code, bool isError) => Cache.GetOrAdd((code, isError), static key =>
    {
        var (code, isError) = key;
        var (category, title) = Family(code);
        return new DiagnosticDescriptor(code, title, "{0}", category,
            isError ? DiagnosticSeverity.Error : DiagnosticSeverity.Warning, isEnabledByDefault: true);
    });

    private static (string Category, string Title) Family(string code) =>
        code.Length > 3 ? code[3] switch
        {
            '1' => ("MotionSpec.Syntax", "Spec syntax"),
            '2' => ("MotionSpec.Names", "Spec names and frames"),
            '3' => ("MotionSpec.Units", "Spec units and dimensions"),
            '4' => ("MotionSpec.Kinematics", "Spec kinematics"),
            _ => ("MotionSpec.Output", "Spec evaluation and output"),
        }
        : ("MotionSpec.Output", "Spec evaluation and output");
}
