namespace MotionSpec.CSharp.Naming;

/// <summary>
/// The words C# gives a meaning to. Reserved words must be written with <c>@</c> to serve as names; the
/// contextual ones are legal names, but escaping them too costs nothing and keeps every future language
/// version (where a contextual word may start to mean something in a new place) from changing our code.
/// </summary>
internal static class CSharpKeywords
{
    private static readonly HashSet<string> Reserved = new(StringComparer.Ordinal)
    {
        "abstract", "as", "base", "bool", "break", "byte", "case", "catch", "char", "checked", "class", "const",
        "continue", "decimal", "default", "delegate", "do", "double", "else", "enum", "event", "explicit",
        "extern", "false", "finally", "fixed", "float", "for", "foreach", "goto", "if", "implicit", "in", "int",
        "interface", "internal", "is", "lock", "long", "namespace", "new", "null", "object", "operator", "out",
        "override", "params", "private", "protected", "public", "readonly", "ref", "return", "sbyte", "sealed",
        "short", "sizeof", "stackalloc", "static", "string", "struct", "switch", "this", "throw", "true", "try",
        "typeof", "uint", "ulong", "unchecked", "unsafe", "ushort", "using", "virtual", "void", "volatile",
        "while",
    };

    private static readonly HashSet<string> Contextual = new(StringComparer.Ordinal)
    {
        "add", "allows", "alias", "and", "ascending", "args", "async", "await", "by", "descending", "dynamic",
        "equals", "extension", "field", "file", "from", "get", "global", "group", "init", "into", "join", "let",
        "managed", "nameof", "nint", "not", "notnull", "nuint", "on", "or", "orderby", "partial", "record",
        "remove", "required", "scoped", "select", "set", "unmanaged", "value", "var", "when", "where", "with",
        "yield",
    };

    /// <summary>True for a word that can be a C# name only with <c>@</c> in front.</summary>
    public static bool IsReserved(string name) => Reserved.Contains(name);

    /// <summary>True for a word with a meaning in some C# contexts.</summary>
    public static bool IsContextual(string name) => Contextual.Contains(name);
}
