using System.Diagnostics;
using System.Text.Json;

namespace MotionSpec.Derivation.Tests.Support;

/// <summary>
/// Runs tests/MotionSpec.Derivation.Tests/katex/check-formulas.js under node: KaTeX, a TeX math parser
/// the project did not write, parses every formula in strict mode.
/// </summary>
internal static class KatexChecker
{
    public static string? Folder { get; } = FindFolder();

    /// <summary>Null when node and the installed katex package are both there; else why not.</summary>
    public static string? Unavailable { get; } = FindProblem();

    public static IReadOnlyList<string> Check(IEnumerable<TexFormulas.Found> formulas)
    {
        Assert.True(Unavailable is null, "the KaTeX check cannot run: " + Unavailable);
        var input = Path.Combine(Path.GetTempPath(), "motionspec-katex-" + Guid.NewGuid().ToString("N") + ".json");
        File.WriteAllText(input, JsonSerializer.Serialize(formulas.Select(f => new { tex = f.Tex, display = f.Display, where = f.Where })));
        try
        {
            var (code, stdout, stderr) = Run("node", Path.Combine(Folder!, "check-formulas.js"), input);
            Assert.True(code is 0 or 1, $"the KaTeX checker failed to run (exit {code}): {stderr}");
            using var report = JsonDocument.Parse(stdout);
            return report.RootElement.GetProperty("failures").EnumerateArray()
                .Select(f => $"{f.GetProperty("where").GetString()}: {f.GetProperty("error").GetString()}")
                .ToList();
        }
        finally
        {
            File.Delete(input);
        }
    }

    public static (int Code, string Stdout, string Stderr) Run(string program, params string[] arguments)
    {
        var start = new ProcessStartInfo(program) { RedirectStandardOutput = true, RedirectStandardError = true, UseShellExecute = false };
        foreach (var a in arguments)
        {
            start.ArgumentList.Add(a);
        }

        using var process = Process.Start(start)!;
        var stdout = process.StandardOutput.ReadToEndAsync();
        var stderr = process.StandardError.ReadToEndAsync();
        if (!process.WaitForExit(120_000))
        {
            process.Kill(entireProcessTree: true);
            throw new TimeoutException(program + " did not finish in two minutes");
        }

        return (process.ExitCode, stdout.Result, stderr.Result);
    }

    public static bool OnPath(string program) =>
        (Environment.GetEnvironmentVariable("PATH") ?? string.Empty).Split(Path.PathSeparator)
            .Any(d => d.Length > 0 && File.Exists(Path.Combine(d, program)));

    private static string? FindFolder()
    {
        for (var dir = new DirectoryInfo(AppContext.BaseDirectory); dir is not null; dir = dir.Parent)
        {
            var candidate = Path.Combine(dir.FullName, "katex");
            if (File.Exists(Path.Combine(candidate, "check-formulas.js")))
            {
                return candidate;
            }
        }

        return null;
    }

    private static string? FindProblem()
    {
        if (Folder is null)
        {
            return "the katex folder of the test project was not found";
        }

        if (!OnPath("node"))
        {
            return "node is not on PATH";
        }

        return File.Exists(Path.Combine(Folder, "node_modules", "katex", "package.json"))
            ? null
            : "katex is not installed (run npm ci in tests/MotionSpec.Derivation.Tests/katex)";
    }
}

/// <summary>
/// A fact that needs node and KaTeX. Outside CI it is skipped, saying why, when they are missing; with the CI
/// variable set it always runs, so a missing install fails loudly there.
/// </summary>
[AttributeUsage(AttributeTargets.Method)]
public sealed class KatexFactAttribute : FactAttribute
{
    public KatexFactAttribute()
    {
        if (KatexChecker.Unavailable is { } why && string.IsNullOrEmpty(Environment.GetEnvironmentVariable("CI")))
        {
            Skip = "KaTeX check skipped: " + why + " (set CI=1 to make this an error)";
        }
    }
}
