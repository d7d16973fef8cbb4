using System.Text;
using MotionSpec.Language.Diagnostics;
using MotionSpec.Language.Text;

namespace MotionSpec.Language.Tests;

/// <summary>Lines and columns as editors count them: from 1, a column per Unicode scalar value, a tab is one.</summary>
public class ColumnTests
{
    private static LinePosition FirstError(byte[] bytes)
    {
        var bag = new DiagnosticBag();
        var source = FrontEnd.Decode("c.motion", bytes, bag);
        Assert.NotNull(source);
        FrontEnd.Run(source!, bag);
        Assert.NotEmpty(bag.Items);
        return bag.Items[0].Start!.Value;
    }

    private static LinePosition FirstError(string text) => FirstError(Encoding.UTF8.GetBytes(text));

    [Fact]
    public void A_tab_is_one_column()
    {
        Assert.Equal(new LinePosition(1, 13), FirstError("param\ta\t=\t1\t?"[..12] + "?"));
        Assert.Equal(new LinePosition(2, 3), FirstError("param a = 1\n\t\tparam b = zz"[..14] + "?"));
    }

    [Theory]
    [InlineData("\n")]
    [InlineData("\r\n")]
    [InlineData("\r")]
    public void Each_line_end_starts_a_line(string end)
    {
        Assert.Equal(new LinePosition(3, 11), FirstError($"param a = 1{end}param b = 2{end}param c = q"));
    }

    [Fact]
    public void Crlf_counts_as_one_line_end_and_lone_cr_lines_mix()
    {
        Assert.Equal(new LinePosition(4, 1), FirstError("param a = 1\r\n\r\r\n?"));
    }

    [Fact]
    public void A_byte_order_mark_is_skipped_and_not_counted()
    {
        var bytes = new byte[] { 0xEF, 0xBB, 0xBF }.Concat(Encoding.UTF8.GetBytes("param a = ?")).ToArray();
        Assert.Equal(new LinePosition(1, 11), FirstError(bytes));
    }

    [Fact]
    public void Non_ascii_characters_count_one_column_each_scalar()
    {
        // 'é' is one UTF-16 unit, the rocket emoji two (a surrogate pair); each is one scalar value.
        Assert.Equal(new LinePosition(1, 19), FirstError("title \"é🚀x\" param ?"));
        Assert.Equal(new LinePosition(1, 7), FirstError("param 🚀 = 1"));
    }

    [Fact]
    public void Invalid_utf8_is_located_at_the_first_bad_byte()
    {
        foreach (var (bytes, line, column) in new (byte[], int, int)[]
        {
            ([0x70, 0xC3], 1, 2),                         // truncated two-byte sequence
            ([0x0A, 0x61, 0xC0, 0x80], 2, 2),             // overlong encoding of NUL
            ([0xE2, 0x82, 0xAC, 0xED, 0xA0, 0x80], 1, 2), // euro sign, then an encoded surrogate
            ([0xF4, 0x90, 0x80, 0x80], 1, 1),             // beyond U+10FFFF
            ([0xEF, 0xBB, 0xBF, 0x61, 0x80], 1, 2),        // stray continuation byte after a BOM
        })
        {
            var bag = new DiagnosticBag();
            Assert.Null(FrontEnd.Decode("bad.motion", bytes, bag));
            var d = Assert.Single(bag.Items);
            Assert.Equal(LanguageDiagnosticCodes.InvalidUtf8, d.Code);
            Assert.Equal(new LinePosition(line, column), d.Start);
        }
    }

    [Fact]
    public void End_positions_are_exclusive()
    {
        var d = Compile.Expect("param a = 1\nparam b = lenn", LanguageDiagnosticCodes.UnknownName, 2, 11);
        Assert.Equal(new LinePosition(2, 15), d.End);
    }
}
