namespace MotionSpec.Language.Lexing;

/// <summary>
/// The one table of reserved words: statement and clause keywords, <c>t</c> and <c>pi</c>, and the function
/// names. The tokenizer, the tests and the editor grammar all read it from here.
/// </summary>
internal static class Keywords
{
    /// <summary>Reserved words that are not function names, with their token kinds.</summary>
    public static IReadOnlyList<KeyValuePair<string, MotionToken>> Words { get; } =
    [
        new("title", MotionToken.Title),
        new("param", MotionToken.Param),
        new("coord", MotionToken.Coord),
        new("let", MotionToken.Let),
        new("frame", MotionToken.Frame),
        new("in", MotionToken.In),
        new("at", MotionToken.At),
        new("origin", MotionToken.Origin),
        new("rotate", MotionToken.Rotate),
        new("about", MotionToken.About),
        new("by", MotionToken.By),
        new("spin", MotionToken.Spin),
        new("point", MotionToken.Point),
        new("report", MotionToken.Report),
        new("via", MotionToken.Via),
        new("basis", MotionToken.Basis),
        new("as", MotionToken.As),
        new("t", MotionToken.Time),
        new("pi", MotionToken.Pi),
    ];

    /// <summary>The function names, all lexed as <see cref="MotionToken.Function"/>.</summary>
    public static IReadOnlyList<string> Functions { get; } =
        ["sin", "cos", "tan", "asin", "acos", "atan", "atan2", "sqrt", "exp", "ln", "cross", "dot"];

    /// <summary>Every reserved word, keywords first, then functions.</summary>
    public static IReadOnlyList<string> All { get; } = Words.Select(w => w.Key).Concat(Functions).ToList();

    /// <summary>Statement keywords: where recovery after an error restarts.</summary>
    public static IReadOnlyList<MotionToken> StatementStarts { get; } =
    [
        MotionToken.Title, MotionToken.Param, MotionToken.Coord, MotionToken.Let, MotionToken.Frame,
        MotionToken.Point, MotionToken.Report, MotionToken.Rotate, MotionToken.Origin, MotionToken.Spin,
    ];

    private static readonly Dictionary<string, MotionToken> Lookup = BuildLookup();

    /// <summary>The token kind of a word: a keyword's kind, <see cref="MotionToken.Function"/> or <see cref="MotionToken.Identifier"/>.</summary>
    public static MotionToken Classify(string word) =>
        Lookup.TryGetValue(word, out var kind) ? kind : MotionToken.Identifier;

    /// <summary>True for every reserved word.</summary>
    public static bool IsReserved(string word) => Lookup.ContainsKey(word);

    private static Dictionary<string, MotionToken> BuildLookup()
    {
        var lookup = new Dictionary<string, MotionToken>(StringComparer.Ordinal);
        foreach (var word in Words)
        {
            lookup.Add(word.Key, word.Value);
        }

        foreach (var function in Functions)
        {
            lookup.Add(function, MotionToken.Function);
        }

        return lookup;
    }
}
