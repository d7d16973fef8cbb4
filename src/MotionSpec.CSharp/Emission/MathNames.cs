using System.Text.RegularExpressions;

namespace MotionSpec.CSharp.Emission;

/// <summary>
/// Writes every <c>Math.</c> and <c>MathF.</c> of printed code as <c>global::System.Math.</c>, so that a type
/// or namespace called Math in the consumer's project (or in the namespace chosen for the evaluator) cannot
/// capture the calls. Spec names reach expressions only after <c>p.</c> or <c>s.</c>, so no name can match.
/// </summary>
internal static class MathNames
{
    private static readonly Regex Bare = new(@"(?<![A-Za-z0-9_.@:])(Math|MathF)\.", RegexOptions.CultureInvariant, TimeSpan.FromSeconds(5));

    public static string Qualify(string code) => Bare.Replace(code, "global::System.$1.");
}
