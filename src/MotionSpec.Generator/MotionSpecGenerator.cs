using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Diagnostics;

namespace MotionSpec.Generator;

/// <summary>
/// Turns every <c>.motion</c> file a project lists as AdditionalFiles into a C# evaluator at build time, by
/// the same pipeline the command line uses (SpecCompiler.Check, then the C# emitter). Spec errors and
/// emission warnings are reported as compiler diagnostics at the spec's own line and column.
/// </summary>
[Generator(LanguageNames.CSharp)]
public sealed class MotionSpecGenerator : IIncrementalGenerator
{
    /// <inheritdoc/>
    public void Initialize(IncrementalGeneratorInitializationContext context)
    {
        var specs = context.AdditionalTextsProvider
            .Where(static file => file.Path.EndsWith(".motion", StringComparison.OrdinalIgnoreCase))
            .Combine(context.AnalyzerConfigOptionsProvider)
            .Select(static (pair, cancellation) =>
            {
                var (file, options) = pair;
                var text = file.GetText(cancellation)?.ToString();
                return new SpecInput(file.Path, text, SpecOptions.Read(options.GlobalOptions, options.GetOptions(file)));
            })
            .Select(static (input, _) => SpecGeneration.Run(input));

        context.RegisterSourceOutput(specs, static (output, generated) => generated.AddTo(output));
    }
}

/// <summary>One spec file as the generator sees it: its path, text (null when unreadable) and options.</summary>
internal sealed record SpecInput(string Path, string? Text, SpecOptions Options);

/// <summary>
/// Options from MSBuild: <c>MotionSpecNamespace</c> and <c>MotionSpecFloat</c> as properties (for all specs)
/// or as metadata on one AdditionalFiles item, with <c>MotionSpecClass</c> per item.
/// </summary>
internal sealed record SpecOptions(string? Namespace, string? ClassName, bool UseFloat)
{
    public static SpecOptions Read(AnalyzerConfigOptions global, AnalyzerConfigOptions file)
    {
        string? Get(string name) =>
            file.TryGetValue("build_metadata.AdditionalFiles." + name, out var own) && !string.IsNullOrWhiteSpace(own) ? own.Trim()
            : global.TryGetValue("build_property." + name, out var all) && !string.IsNullOrWhiteSpace(all) ? all.Trim()
            : null;

        var useFloat = string.Equals(Get("MotionSpecFloat"), "true", StringComparison.OrdinalIgnoreCase);
        file.TryGetValue("build_metadata.AdditionalFiles.MotionSpecClass", out var className);
        return new SpecOptions(Get("MotionSpecNamespace"), string.IsNullOrWhiteSpace(className) ? null : className!.Trim(), useFloat);
    }
}
