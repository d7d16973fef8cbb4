namespace MotionSpec.CSharp.Tests;

/// <summary>The repository root: the nearest folder above the test binaries that holds MotionSpec.sln.</summary>
internal static class RepoRoot
{
    public static string Path { get; } = Find();

    public static IEnumerable<string> DemoSpecs() =>
        Directory.EnumerateFiles(System.IO.Path.Combine(Path, "specs-demo"), "*.motion").Order(StringComparer.Ordinal);

    private static string Find()
    {
        for (var folder = new DirectoryInfo(AppContext.BaseDirectory); folder is not null; folder = folder.Parent)
        {
            if (File.Exists(System.IO.Path.Combine(folder.FullName, "MotionSpec.sln")))
            {
                return folder.FullName;
            }
        }

        throw new InvalidOperationException("MotionSpec.sln not found above " + AppContext.BaseDirectory);
    }
}
