using System.CommandLine;

namespace MotionSpec.Cli;

/// <summary>
/// The options that fix the state a spec is evaluated at, shared by <c>eval</c> and <c>plot</c> so that both
/// spell and document them the same way. Parsing the values (units, sweeps, marks) is the evaluating
/// command's job; here they are kept as the text the user typed.
/// </summary>
internal static class StateOptions
{
    /// <summary><c>--t VALUE</c> or <c>--t START:STEP:STOP</c>, in seconds unless a time unit is written.</summary>
    public static Option<string> CreateTime(string defaultValue, string description) =>
        new("--t")
        {
            Description = description,
            HelpName = "VALUE|START:STEP:STOP",
            DefaultValueFactory = _ => defaultValue,
        };

    /// <summary><c>--set NAME=VALUE</c>, repeatable: a param override or a coord's value, rate or acceleration.</summary>
    public static Option<string[]> CreateSet() =>
        new("--set")
        {
            Description = "Override a param (L=20m) or set a coord's value (psi=0.2), rate (psi'=10deg/s) or acceleration (psi''=...); repeatable. A value without a unit is in SI. Coords not set are 0.",
            HelpName = "NAME=VALUE",
            Arity = ArgumentArity.OneOrMore,
            AllowMultipleArgumentsPerToken = false,
        };

    /// <summary><c>--report NAME</c>, repeatable: which reports, all when absent.</summary>
    public static Option<string[]> CreateReports() =>
        new("--report")
        {
            Description = "A report to evaluate, by name; repeatable. Default: every report. Output keeps file order.",
            HelpName = "NAME",
            Arity = ArgumentArity.OneOrMore,
            AllowMultipleArgumentsPerToken = false,
        };
}
