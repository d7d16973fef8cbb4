using Superpower.Display;

namespace MotionSpec.Language.Lexing;

/// <summary>The kinds of token in a spec. Keywords each have their own kind so that parsers can name them.</summary>
internal enum MotionToken
{
    /// <summary>A name: a letter or <c>_</c>, then letters, digits or <c>_</c>.</summary>
    [Token(Category = "name", Example = "psi")]
    Identifier,

    /// <summary>A number literal such as <c>1.5</c> or <c>2e-3</c>.</summary>
    [Token(Category = "number", Example = "1.5")]
    Number,

    /// <summary>A unit directly following a number, such as <c>m/s^2</c>.</summary>
    [Token(Category = "unit", Example = "m/s^2")]
    Unit,

    /// <summary>A double-quoted string (only after <c>title</c>).</summary>
    [Token(Category = "string", Example = "\"Crane\"")]
    String,

    /// <summary>One or two marks directly after a name: <c>'</c> or <c>''</c>.</summary>
    [Token(Category = "mark", Example = "'")]
    Mark,

    /// <summary>A function name: <c>sin cos tan asin acos atan atan2 sqrt exp ln cross dot</c>.</summary>
    [Token(Category = "function", Example = "sin")]
    Function,

    [Token(Category = "keyword", Example = "title")]
    Title,

    [Token(Category = "keyword", Example = "param")]
    Param,

    [Token(Category = "keyword", Example = "coord")]
    Coord,

    [Token(Category = "keyword", Example = "let")]
    Let,

    [Token(Category = "keyword", Example = "frame")]
    Frame,

    [Token(Category = "keyword", Example = "in")]
    In,

    [Token(Category = "keyword", Example = "at")]
    At,

    [Token(Category = "keyword", Example = "origin")]
    Origin,

    [Token(Category = "keyword", Example = "rotate")]
    Rotate,

    [Token(Category = "keyword", Example = "about")]
    About,

    [Token(Category = "keyword", Example = "by")]
    By,

    [Token(Category = "keyword", Example = "spin")]
    Spin,

    [Token(Category = "keyword", Example = "point")]
    Point,

    [Token(Category = "keyword", Example = "report")]
    Report,

    [Token(Category = "keyword", Example = "via")]
    Via,

    [Token(Category = "keyword", Example = "basis")]
    Basis,

    [Token(Category = "keyword", Example = "as")]
    As,

    [Token(Category = "keyword", Example = "t")]
    Time,

    [Token(Category = "keyword", Example = "pi")]
    Pi,

    [Token(Example = "+")]
    Plus,

    [Token(Example = "-")]
    Minus,

    [Token(Example = "*")]
    Star,

    [Token(Example = "/")]
    Slash,

    [Token(Example = "^")]
    Caret,

    [Token(Example = "(")]
    LeftParen,

    [Token(Example = ")")]
    RightParen,

    [Token(Example = "[")]
    LeftBracket,

    [Token(Example = "]")]
    RightBracket,

    [Token(Example = "{")]
    LeftBrace,

    [Token(Example = "}")]
    RightBrace,

    [Token(Example = ",")]
    Comma,

    [Token(Example = ".")]
    Dot,

    [Token(Example = "=")]
    Equals,

    /// <summary><c>:</c>, the last kind: parsers size their tables by it.</summary>
    [Token(Example = ":")]
    Colon,
}
