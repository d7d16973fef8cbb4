namespace MotionSpec.Cli;

/// <summary>
/// The process exit codes every command shares. Scripts and build systems branch on these, so a new
/// command reuses them instead of inventing its own.
/// </summary>
internal static class ExitCodes
{
    /// <summary>Everything asked for was done; warnings may have been printed.</summary>
    public const int Success = 0;

    /// <summary>A spec has errors, or evaluating or writing its results failed.</summary>
    public const int SpecErrors = 1;

    /// <summary>The command line itself is wrong: an unknown option, a bad value, a file that cannot be read.</summary>
    public const int Usage = 2;
}
