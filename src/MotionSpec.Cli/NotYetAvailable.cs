namespace MotionSpec.Cli;

/// <summary>
/// What a command whose stage has not been wired in yet answers: a plain statement on standard error and a
/// non-zero exit, so no script mistakes it for a result.
/// </summary>
internal static class NotYetAvailable
{
    /// <summary>Writes the notice for <paramref name="command"/> and returns <see cref="ExitCodes.Usage"/>.</summary>
    public static int Report(string command, TextWriter stderr)
    {
        stderr.WriteLine($"motionspec {command}: coming in a later change");
        return ExitCodes.Usage;
    }
}
