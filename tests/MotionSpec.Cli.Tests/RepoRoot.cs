namespace MotionSpec.Cli.Tests;

/// <summary>Finds the repository by walking up from the test binaries to MotionSpec.sln.</summary>
internal static class RepoRoot
{
    public static string Find()
    {
        for (var dir = new DirectoryInfo(AppContext.BaseDirectory); dir is not null; dir = dir.Parent)
        {
            if (File.Exists(Path.Combine(dir.FullName, "MotionSpec.sln")))
            {
                return dir.FullName;
            }
        }

        throw new InvalidOperationException("MotionSpec.sln not found above " + AppContext.BaseDirectory);
    }
}
