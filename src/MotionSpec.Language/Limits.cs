namespace MotionSpec.Language;

/// <summary>
/// The documented limits of the language. A spec beyond one gets an error naming the limit, never a crash.
/// </summary>
public static class Limits
{
    /// <summary>Largest file accepted, in bytes (16 MiB).</summary>
    public const int FileSizeBytes = 16 * 1024 * 1024;

    /// <summary>
    /// Deepest expression nesting: every open parenthesis, bracket and call counts one level, and so does each
    /// unary minus and each <c>^</c> in an unbroken chain (<c>- - x</c>, <c>a^b^c</c>). Checked on the tokens
    /// before parsing, so deep input cannot exhaust the stack.
    /// </summary>
    public const int ExpressionNesting = 256;

    /// <summary>
    /// Most binary operators in one statement. Long sums and products build deep trees for every later
    /// stage, so they are bounded too.
    /// </summary>
    public const int OperatorsPerStatement = 4096;

    /// <summary>Deepest frame: a root has depth 0 and each child one more than its parent.</summary>
    public const int FrameTreeDepth = 500;

    /// <summary>Most frames in one spec.</summary>
    public const int Frames = 10_000;

    /// <summary>Most points in one spec.</summary>
    public const int Points = 100_000;

    /// <summary>Most reports in one spec.</summary>
    public const int Reports = 1_000;

    /// <summary>Most samples in one time sweep of <c>eval</c> or <c>plot</c>.</summary>
    public const int SweepSamples = 1_000_000;

    /// <summary>Longest number literal, in characters (exact arithmetic on longer ones would be slow).</summary>
    public const int NumberLength = 1_000;

    /// <summary>Largest magnitude of an exponent inside a unit or of an exact power (<c>m^3</c>, <c>x^-2</c>).</summary>
    public const int Exponent = 1_000;
}
