using System.Collections.Immutable;
using Microsoft.CodeAnalysis;

namespace MotionSpec.CSharp.Analysis;

/// <summary>
/// The assemblies the generated file is compiled against: the running framework's own, loaded once per
/// process (metadata is read lazily, so the cost is paid only for what the code touches).
/// </summary>
internal static class FrameworkReferences
{
    private static readonly Lazy<ImmutableArray<MetadataReference>> Core = new(Load);

    public static ImmutableArray<MetadataReference> All => Core.Value;

    private static ImmutableArray<MetadataReference> Load()
    {
        // Every assembly of the shared framework the process runs on (not the application's own), so that a
        // stray call into the wider library still binds and is reported as a call rather than as a compile error.
        var folder = Path.GetDirectoryName(typeof(object).Assembly.Location) ?? string.Empty;
        var paths = new List<string>();
        if (AppContext.GetData("TRUSTED_PLATFORM_ASSEMBLIES") is string trusted)
        {
            paths.AddRange(trusted.Split(Path.PathSeparator)
                .Where(p => string.Equals(Path.GetDirectoryName(p), folder, StringComparison.Ordinal)));
        }

        if (paths.Count == 0 && folder.Length > 0)
        {
            // Hosts that do not publish the list: the folder of the core library holds the framework.
            paths.AddRange(Directory.EnumerateFiles(folder, "*.dll"));
        }

        return paths.Where(IsManagedAssemblyName).OrderBy(p => p, StringComparer.Ordinal)
            .Select(p => (MetadataReference)MetadataReference.CreateFromFile(p))
            .ToImmutableArray();
    }

    // Native libraries of the runtime sit in the same folder; only System.*, Microsoft.* and the facades are managed.
    private static bool IsManagedAssemblyName(string path)
    {
        var name = Path.GetFileName(path);
        return name.EndsWith(".dll", StringComparison.OrdinalIgnoreCase)
            && (name.StartsWith("System.", StringComparison.Ordinal) || name.StartsWith("Microsoft.", StringComparison.Ordinal)
                || name is "netstandard.dll" or "mscorlib.dll");
    }
}
