namespace MotionSpec.Language.Diagnostics;

/// <summary>How serious a diagnostic is: errors stop every output, warnings do not.</summary>
public enum DiagnosticSeverity
{
    /// <summary>The spec cannot be used as written.</summary>
    Error,

    /// <summary>The spec works, but something deserves a look.</summary>
    Warning,
}
