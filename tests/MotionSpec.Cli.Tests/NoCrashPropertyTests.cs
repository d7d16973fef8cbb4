using System.Text;
using System.Text.RegularExpressions;
using CsCheck;

namespace MotionSpec.Cli.Tests;

/// <summary>
/// CLI.md: no input may crash the tool. Whatever the bytes, <c>check</c> ends with exit 0 or 1, prints only
/// compiler-convention lines on stderr and never reaches the internal-error line (MOT5999).
/// </summary>
public sealed partial class NoCrashPropertyTests : IDisposable
{
    private static readonly string[] Fragments =
    [
        "title \"Crane\"", "param", "coord", "let", "frame", "in", "at", "origin", "rotate", "about", "by", "spin",
        "point", "report", "via", "basis", "as", "t", "pi", "sin", "cos", "atan2", "sqrt", "cross", "dot", "x", "y",
        "z", "quay", "boom", "hook", "tip", "L", "psi", "s", "psi'", "psi''", "=", ":", "angle", "length", "{", "}",
        "[", "]", "(", ")", ",", "+", "-", "*", "/", "^", ".", "0", "1.5", ".5", "2e-3", "18 m", "0.6 rpm", "9.81 m/s^2",
        "100ms", "3 in", "2 h", "90 deg", "1.", "q'''", "#", "\n", "\r\n", "\t", "boom.x", "in quay", "1e400", "0/0",
    ];

    private readonly TempFolder _folder = new();

    public void Dispose() => _folder.Dispose();

    [GeneratedRegex(@"^.+\(\d+,\d+\): (error|warning) MOT[1-4]\d{3}: .+$")]
    private static partial Regex CompilerLine();

    private void AssertChecksWithoutCrashing(byte[] bytes)
    {
        var spec = _folder.WriteBytes(Guid.NewGuid().ToString("N") + ".motion", bytes);
        var run = CliRun.Of("check", spec);
        File.Delete(spec);

        Assert.True(run.ExitCode is ExitCodes.Success or ExitCodes.SpecErrors, $"exit {run.ExitCode}: {run.Stderr}");
        Assert.Equal(string.Empty, run.Stdout);
        Assert.All(run.StderrLines, line => Assert.Matches(CompilerLine(), line));
        Assert.Equal(run.ExitCode == ExitCodes.SpecErrors, run.StderrLines.Any(l => l.Contains("): error MOT", StringComparison.Ordinal)));
    }

    [Fact]
    public void Random_bytes_never_crash_check() =>
        Gen.Byte.Array[0, 400].Sample(AssertChecksWithoutCrashing, iter: 150, threads: 1);

    [Fact]
    public void Random_sequences_of_language_fragments_never_crash_check() =>
        Gen.OneOf(Fragments).Array[0, 80]
            .Select(parts => Encoding.UTF8.GetBytes(string.Join(' ', parts)))
            .Sample(AssertChecksWithoutCrashing, iter: 100, threads: 1);

    [Fact]
    public void Damaged_demo_specs_never_crash_check()
    {
        var demos = Directory.GetFiles(Path.Combine(RepoRoot.Find(), "specs-demo"), "*.motion")
            .Order(StringComparer.Ordinal)
            .Select(File.ReadAllText)
            .ToArray();

        // Cut a slice out of a demo spec, or paste a fragment into it: near-valid specs reach the binder
        // and the kinematics stage, where random bytes rarely get.
        var damaged =
            from demo in Gen.OneOf(demos)
            from start in Gen.Int[0, 10_000]
            from length in Gen.Int[0, 40]
            from fragment in Gen.OneOf(Fragments)
            from paste in Gen.Bool
            let at = start % (demo.Length + 1)
            let cut = Math.Min(length, demo.Length - at)
            select paste ? demo.Insert(at, " " + fragment + " ") : demo.Remove(at, cut);

        // Few iterations: a damaged spec that still checks clean runs the whole kinematics stage.
        damaged.Select(text => Encoding.UTF8.GetBytes(text)).Sample(AssertChecksWithoutCrashing, iter: 25, threads: 1);
    }
}
