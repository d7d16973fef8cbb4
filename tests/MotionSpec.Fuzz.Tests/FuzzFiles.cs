namespace MotionSpec.Fuzz.Tests;

/// <summary>Finds the fuzz project's folders from the test's output directory.</summary>
internal static class FuzzFiles
{
    public static string FuzzFolder { get; } = Find();

    public static string Corpus => Path.Combine(FuzzFolder, "corpus");

    public static string Regressions => Path.Combine(FuzzFolder, "regressions");

    public static string Dictionary => Path.Combine(FuzzFolder, "motion.dict");

    /// <summary>The file names of every input in a folder (notes such as README.md are not inputs).</summary>
    public static IReadOnlyList<string> Inputs(string folder) =>
        Directory.GetFiles(folder)
            .Select(f => Path.GetFileName(f))
            .Where(f => !f.EndsWith(".md", StringComparison.Ordinal) && !f.StartsWith('.'))
            .Order(StringComparer.Ordinal)
            .ToList();

    private static string Find()
    {
        for (var dir = new DirectoryInfo(AppContext.BaseDirectory); dir is not null; dir = dir.Parent)
        {
            var candidate = Path.Combine(dir.FullName, "tests", "MotionSpec.Fuzz");
            if (File.Exists(Path.Combine(dir.FullName, "MotionSpec.sln")) && Directory.Exists(candidate))
            {
                return candidate;
            }
        }

        throw new DirectoryNotFoundException("tests/MotionSpec.Fuzz not found above " + AppContext.BaseDirectory);
    }
}
