namespace MotionSpec.Cli;

/// <summary>
/// The last line of defence: an exception that escaped every stage is a defect in motionspec, not in the
/// user's spec. It is reported in one line with a code of its own and no stack trace, and the process exits
/// with <see cref="ExitCodes.SpecErrors"/> like any other failed run.
/// </summary>
internal static class InternalError
{
    /// <summary>The code that marks a defect of the tool itself.</summary>
    public const string Code = "MOT5999";

    /// <summary>Writes the one-line report and returns the exit code to use.</summary>
    public static int Report(TextWriter stderr, Exception exception)
    {
        ArgumentNullException.ThrowIfNull(stderr);
        ArgumentNullException.ThrowIfNull(exception);
        var message = exception.Message.ReplaceLineEndings(" ");
        stderr.WriteLine(
            $"motionspec: error {Code}: internal error ({exception.GetType().Name}: {message}). This is a defect in motionspec, not in the spec; please report it together with the spec that caused it.");
        return ExitCodes.SpecErrors;
    }
}
