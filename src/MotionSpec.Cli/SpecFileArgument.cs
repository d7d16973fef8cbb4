using System.CommandLine;

namespace MotionSpec.Cli;

/// <summary>
/// The FILE argument of the commands. A word that starts with '-' where a file is expected is an option
/// motionspec does not know (a misspelt <c>--diagnostic</c>, say): it is reported as such, exit 2, instead of
/// as a missing file. A file whose name starts with '-' is still reachable as <c>./-name</c>.
/// </summary>
internal static class SpecFileArgument
{
    /// <summary>Exactly one spec file.</summary>
    public static Argument<string> CreateOne(string description)
    {
        var argument = new Argument<string>("FILE") { Description = description };
        argument.Validators.Add(RejectOptionLikeWords);
        return argument;
    }

    /// <summary>One or more spec files.</summary>
    public static Argument<string[]> CreateMany(string description)
    {
        var argument = new Argument<string[]>("FILE") { Description = description, Arity = ArgumentArity.OneOrMore };
        argument.Validators.Add(RejectOptionLikeWords);
        return argument;
    }

    private static void RejectOptionLikeWords(System.CommandLine.Parsing.ArgumentResult result)
    {
        foreach (var token in result.Tokens)
        {
            if (token.Value.Length > 1 && token.Value[0] == '-')
            {
                result.AddError($"Unknown option '{token.Value}'. (A file whose name starts with '-' can be given as ./{token.Value}.)");
            }
        }
    }
}
