using System.Globalization;
using MotionSpec.Fuzz;
using SharpFuzz;

// Under afl-fuzz (no arguments): the fork server, each input read from standard input. The fuzzed code runs
// in a child process so that a hang or a stack overflow costs a restart instead of the whole campaign.
// "--replay FILE|DIR..." runs saved inputs in this process, one line each: how far it went, or the exception
// that escaped. run-fuzz.sh uses it to say what each crash it found is.
if (args.Length > 0 && args[0] == "--replay")
{
    return Replay.Run(args.Skip(1).ToList(), Console.Out);
}

Fuzzer.OutOfProcess.Run(stream =>
{
    using var memory = new MemoryStream();
    stream.CopyTo(memory);
    SpecFuzzTarget.Run(memory.ToArray());
});
return 0;

/// <summary>Runs saved inputs through the target in process and reports the ones that throw.</summary>
internal static class Replay
{
    public static int Run(IReadOnlyList<string> paths, TextWriter output)
    {
        var files = paths.SelectMany<string, string>(p => Directory.Exists(p)
                ? Directory.GetFiles(p).Where(f => !Path.GetFileName(f).StartsWith('.') && !f.EndsWith(".md", StringComparison.Ordinal)).Order(StringComparer.Ordinal)
                : [p])
            .ToList();
        var failed = 0;
        foreach (var file in files)
        {
            // Any exception is the finding being reported, whatever its type.
#pragma warning disable CA1031
            try
            {
                var outcome = SpecFuzzTarget.Run(File.ReadAllBytes(file));
                output.WriteLine(string.Create(CultureInfo.InvariantCulture, $"{file}: ok, last stage {outcome.LastStage}, diagnostics [{string.Join(", ", outcome.Codes)}]"));
            }
            catch (Exception e)
            {
                failed++;
                output.WriteLine(string.Create(CultureInfo.InvariantCulture, $"{file}: FAILED {Describe(e)}"));
            }
#pragma warning restore CA1031
        }

        output.WriteLine(string.Create(CultureInfo.InvariantCulture, $"replayed {files.Count} input(s), {failed} failed"));
        return failed == 0 ? 0 : 1;
    }

    // The exception's type and message, and the innermost frame in our own code: enough to tell two findings apart.
    private static string Describe(Exception e)
    {
        var frame = (e.StackTrace ?? string.Empty).Split('\n')
            .Select(l => l.Trim())
            .FirstOrDefault(l => l.StartsWith("at MotionSpec.", StringComparison.Ordinal) && !l.StartsWith("at MotionSpec.Fuzz.", StringComparison.Ordinal))
            ?? "(no frame in MotionSpec)";
        return $"{e.GetType().Name}: {e.Message.ReplaceLineEndings(" ")} {frame}";
    }
}
