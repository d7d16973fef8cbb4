namespace MotionSpec.Cli;

/// <summary>How diagnostics are printed on standard error.</summary>
internal enum DiagnosticFormat
{
    /// <summary>One line each, <c>path(line,col): error CODE: message</c>, as editors and build logs expect.</summary>
    Text,

    /// <summary>One JSON array for the whole run, for tools.</summary>
    Json,
}
