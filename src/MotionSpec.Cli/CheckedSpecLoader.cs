using MotionSpec.Compiler;

namespace MotionSpec.Cli;

/// <summary>
/// The first step of every command that works on one spec: read the file, run the compiler's checks, print
/// the diagnostics. The command goes on only when this hands back a spec without errors.
/// </summary>
internal static class CheckedSpecLoader
{
    /// <summary>
    /// Loads and checks <paramref name="path"/>. Returns <see cref="ExitCodes.Success"/> with the checked spec,
    /// or the exit code to stop with: <see cref="ExitCodes.Usage"/> for an unreadable file,
    /// <see cref="ExitCodes.SpecErrors"/> when the spec has errors. Warnings are printed either way.
    /// </summary>
    public static int TryLoad(string path, DiagnosticFormat format, TextWriter stderr, out CheckedSpec? spec)
    {
        spec = null;
        var bytes = SpecFileLoader.TryRead(path, stderr);
        if (bytes is null)
        {
            return ExitCodes.Usage;
        }

        var checkedSpec = SpecCompiler.Check(path, bytes);
        var diagnostics = new DiagnosticWriter(stderr, format);
        diagnostics.Add(path, checkedSpec.Source, checkedSpec.Diagnostics);
        diagnostics.Complete();
        if (checkedSpec.HasErrors)
        {
            return ExitCodes.SpecErrors;
        }

        spec = checkedSpec;
        return ExitCodes.Success;
    }
}
