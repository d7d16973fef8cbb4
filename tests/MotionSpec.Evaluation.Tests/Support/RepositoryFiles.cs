namespace MotionSpec.Evaluation.Tests.Support;

/// <summary>Finds files of the repository from the test's output folder.</summary>
internal static class RepositoryFiles
{
    public static string Root()
    {
        var directory = new DirectoryInfo(AppContext.BaseDirectory);
        while (directory is not null && !File.Exists(Path.Combine(directory.FullName, "MotionSpec.sln")))
        {
            directory = directory.Parent;
        }

        return directory?.FullName ?? throw new InvalidOperationException("MotionSpec.sln not found above " + AppContext.BaseDirectory);
    }

    public static IEnumerable<string> DemoSpecs() =>
        Directory.Exists(Path.Combine(Root(), "specs-demo"))
            ? Directory.GetFiles(Path.Combine(Root(), "specs-demo"), "*.motion").Order(StringComparer.Ordinal)
            : [];
}
