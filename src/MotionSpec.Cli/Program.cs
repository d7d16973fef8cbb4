using System.CommandLine;
using System.CommandLine.Invocation;
using System.Text;
using MotionSpec.Cli.Commands;

namespace MotionSpec.Cli;

/// <summary>The <c>motionspec</c> command.</summary>
internal static class Program
{
    // The compiler's passes recurse over expressions; a generous stack keeps a deeply nested (but legal)
    // spec from ending the process, which no exception handler could report.
    private const int StackBytes = 256 * 1024 * 1024;

    private static int Main(string[] args)
    {
        // Buffered: an evaluation sweep can print a million rows.
        using var stdout = new StreamWriter(Console.OpenStandardOutput(), new UTF8Encoding(false), 1 << 16);
        var stderr = Console.Error;
        var exitCode = ExitCodes.SpecErrors;
        var worker = new Thread(() => exitCode = Run(args, stdout, stderr), StackBytes);
        worker.Start();
        worker.Join();
        stdout.Flush();
        return exitCode;
    }

    /// <summary>
    /// Parses and runs one command line, writing only to the given writers. Tests call this directly; an
    /// invalid command line exits <see cref="ExitCodes.Usage"/>, and nothing escapes as an exception.
    /// </summary>
    internal static int Run(string[] args, TextWriter stdout, TextWriter stderr)
    {
        try
        {
            var root = MotionSpecRootCommand.Create();
            // '@name' stays a file name: specs are not response files.
            var parseResult = root.Parse(args, new ParserConfiguration { ResponseFileTokenReplacer = null });
            var invocation = new InvocationConfiguration
            {
                Output = stdout,
                Error = stderr,
                EnableDefaultExceptionHandler = false,
            };
            if (parseResult.Action is ParseErrorAction parseError)
            {
                // The library's own error text (with its "did you mean" hints) on stderr, then our exit code;
                // the full help would bury the one line that matters.
                // Its typo hints go to the output writer; a failed command line keeps stdout empty.
                parseError.ShowHelp = false;
                parseResult.Invoke(new InvocationConfiguration { Output = stderr, Error = stderr, EnableDefaultExceptionHandler = false });
                stderr.WriteLine($"Run 'motionspec {CommandPath(parseResult)}--help' to see the usage.");
                return ExitCodes.Usage;
            }

            return parseResult.Invoke(invocation);
        }
#pragma warning disable CA1031 // The one place every unexpected exception is caught: it must become a message, not a crash.
        catch (Exception e)
#pragma warning restore CA1031
        {
            return InternalError.Report(stderr, e);
        }
    }

    private static string CommandPath(ParseResult parseResult)
    {
        var command = parseResult.CommandResult.Command;
        return command is RootCommand ? string.Empty : command.Name + " ";
    }
}
