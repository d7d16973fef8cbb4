using System.Text;
using MotionSpec.Language.Binding;
using MotionSpec.Language.Diagnostics;
using MotionSpec.Language.Lexing;
using MotionSpec.Language.Parsing;
using MotionSpec.Language.Text;

namespace MotionSpec.Language;

/// <summary>
/// The front end's passes in order: decode, tokenize, parse, bind. The command line, the source generator
/// and the tests all come in here.
/// </summary>
public static class FrontEnd
{
    /// <summary>
    /// Decodes a spec file as strict UTF-8, skipping a leading byte-order mark. Returns null after reporting a
    /// MOT1 error at the first bad byte, or when the file is beyond the size limit. Diagnostics of a file that
    /// did not decode carry, in <see cref="Diagnostic.Source"/>, the valid text before the problem, so that
    /// their line and column can be shown.
    /// </summary>
    public static SourceText? Decode(string path, byte[] bytes, DiagnosticBag diagnostics)
    {
        if (bytes.Length > Limits.FileSizeBytes)
        {
            var empty = new SourceText(path, string.Empty);
            diagnostics.Add(new Diagnostic(LanguageDiagnosticCodes.FileTooLarge, DiagnosticSeverity.Error, new TextSpan(0, 0),
                $"the file has {bytes.Length} bytes; the limit is {Limits.FileSizeBytes} bytes (16 MiB)") { Source = empty });
            return null;
        }

        var start = bytes.Length >= 3 && bytes[0] == 0xEF && bytes[1] == 0xBB && bytes[2] == 0xBF ? 3 : 0;
        var bad = Utf8Validator.FirstInvalid(bytes, start);
        if (bad >= 0)
        {
            var prefix = new SourceText(path, Encoding.UTF8.GetString(bytes, start, bad - start));
            diagnostics.Add(new Diagnostic(LanguageDiagnosticCodes.InvalidUtf8, DiagnosticSeverity.Error, new TextSpan(prefix.Content.Length, 0),
                $"the file is not valid UTF-8: byte 0x{bytes[bad]:X2} at offset {bad} cannot start or continue a character; save the file as UTF-8") { Source = prefix });
            return null;
        }

        return new SourceText(path, Encoding.UTF8.GetString(bytes, start, bytes.Length - start));
    }

    /// <summary>
    /// Tokenizes, parses and binds a spec. Every diagnostic of the file is added to the bag, sorted by position.
    /// The bound spec is returned even when there are errors, but it is complete only when there are none.
    /// </summary>
    public static BoundSpec? Run(SourceText source, DiagnosticBag diagnostics)
    {
        var found = new DiagnosticBag();
        var tokenizer = new MotionTokenizer();
        var tokens = tokenizer.TryTokenize(source.Content).Value.ToArray();
        foreach (var error in tokenizer.Errors)
        {
            found.Error(error.Code, error.Span, error.Message);
        }

        var syntax = Parser.Parse(source.Content, tokens, tokenizer.Errors, found);
        var spec = Binder.Bind(source, syntax, found);
        foreach (var diagnostic in found.Sorted())
        {
            diagnostics.Add(diagnostic with { Source = source });
        }

        return spec;
    }
}
