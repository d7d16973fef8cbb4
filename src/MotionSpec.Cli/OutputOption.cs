using System.CommandLine;

namespace MotionSpec.Cli;

/// <summary><c>-o PATH</c> / <c>--output PATH</c>, for the commands that write a file.</summary>
internal static class OutputOption
{
    /// <summary>A fresh output option; <paramref name="required"/> when the command has no stdout form.</summary>
    public static Option<string> Create(string description, bool required) =>
        new("--output", "-o")
        {
            Description = description,
            HelpName = "PATH",
            Required = required,
        };
}
