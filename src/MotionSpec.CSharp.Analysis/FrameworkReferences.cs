using System.Collections.Immutable;
using Microsoft.CodeAnalysis;

namespace MotionSpec.CSharp.Analysis;

/// <summary>
/// The assemblies the generated file is compiled against: the running framework's own core assemblies.
/// The generated code names nothing beyond System.Math, System.MathF and what records need, so the core
/// library and System.Runtime are enough; they are loaded once per process.
/// </summary>
internal static class FrameworkReferences
{
    private static readonly Lazy<ImmutableArray<MetadataReference>> Core = new(Load);

    public static ImmutableArray<MetadataReference> All => Core.Value;

    private static ImmutableArray<MetadataReference> Load()
    {
        var wanted = new[] { "System.Private.CoreLib", "System.Runtime", "netstandard" };
        var paths = new List<string>();
        if (AppContext.GetData("TRUSTED_PLATFORM_ASSEMBLIES") is string trusted)
        {
            paths.AddRange(trusted.Split(Path.PathSeparator)
                .Where(p => wanted.Contains(Path.GetFileNameWithoutExtension(p), StringComparer.OrdinalIgnoreCase)));
        }

        if (paths.Count == 0)
        {
            // Hosts that do not publish the list (some test runners): the folder of the core library has them.
            var folder = Path.GetDirectoryName(typeof(object).Assembly.Location) ?? string.Empty;
            paths.AddRange(wanted.Select(name => Path.Combine(folder, name + ".dll")).Where(File.Exists));
        }

        return paths.OrderBy(p => p, StringComparer.Ordinal)
            .Select(p => (MetadataReference)MetadataReference.CreateFromFile(p))
            .ToImmutableArray();
    }
}
