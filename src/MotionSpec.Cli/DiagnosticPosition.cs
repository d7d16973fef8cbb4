using System.Text;
using MotionSpec.Language.Text;

namespace MotionSpec.Cli;

/// <summary>
/// Turns a diagnostic's span into the lines and columns people see. With decoded text the source's own line
/// map answers. Without it (the bytes were not UTF-8) the span counts bytes of the file, so the valid text
/// before the offset is decoded and measured the same way.
/// </summary>
internal static class DiagnosticPosition
{
    private static readonly UTF8Encoding LenientUtf8 = new(encoderShouldEmitUTF8Identifier: false, throwOnInvalidBytes: false);

    /// <summary>Start (inclusive) and end (exclusive) of a span.</summary>
    public static (LinePosition Start, LinePosition End) Locate(SourceText? source, ReadOnlySpan<byte> bytes, TextSpan span)
    {
        if (source is not null)
        {
            return (source.GetLinePosition(span.Start), source.GetLinePosition(span.End));
        }

        return (FromByteOffset(bytes, span.Start), FromByteOffset(bytes, span.End));
    }

    private static LinePosition FromByteOffset(ReadOnlySpan<byte> bytes, int offset)
    {
        offset = Math.Clamp(offset, 0, bytes.Length);
        var bom = bytes.StartsWith(Encoding.UTF8.Preamble) ? Encoding.UTF8.Preamble.Length : 0;
        var prefix = offset > bom ? LenientUtf8.GetString(bytes[bom..offset]) : string.Empty;
        return new SourceText(string.Empty, prefix).GetLinePosition(prefix.Length);
    }
}
