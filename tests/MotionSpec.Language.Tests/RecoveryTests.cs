using C = MotionSpec.Language.Diagnostics.LanguageDiagnosticCodes;

namespace MotionSpec.Language.Tests;

public class RecoveryTests
{
    [Fact]
    public void One_run_reports_every_error_in_the_file()
    {
        const string text = """
            param L = 18 m +
            param w = 0.6 rpm
            coord q : angle
            let bad = q'''
            frame quay
            frame boom in quay {
                rotate about z by w * t m
                rotate about y by 2 furlong
                origin at [L, 0, 1.]
            }
            frame hook in boom {
                spin [q', 0, 0]
                rotate about x by q
            }
            point tip in hok at [0, 0, -L]
            report tipp in quay
            report hook in quay via boom
            """;
        var errors = Compile.Run(text).Diagnostics;
        var found = errors.Select(d => (d.Code, d.Start!.Value.Line)).ToList();
        Assert.Contains((C.SyntaxError, 1), found);
        Assert.Contains((C.TooManyMarks, 4), found);
        Assert.Contains((C.SyntaxError, 7), found);
        Assert.Contains((C.UnknownUnit, 8), found);
        Assert.Contains((C.DigitAfterPointExpected, 9), found);
        Assert.Contains((C.RotateAndSpin, 13), found);
        Assert.Contains((C.UnknownFrame, 15), found);
        Assert.Contains((C.UnknownSubject, 16), found);
        Assert.Contains((C.ViaOnFrameReport, 17), found);
        Assert.Equal(found.Count, found.Distinct().Count());
    }

    [Fact]
    public void An_unclosed_block_ends_at_the_next_statement()
    {
        var errors = Compile.Run("frame a\nframe b in a {\n  origin at [1, 0, 0]\nframe c in b\npoint p in c at [0, 0, 0]").Diagnostics;
        var d = Assert.Single(errors);
        Assert.Equal(C.UnclosedBlock, d.Code);
    }

    [Fact]
    public void A_failed_frame_header_still_absorbs_its_block()
    {
        var errors = Compile.Run("frame a\nframe b in {\n  origin at [1, 0, 0]\n}\nparam k = 1").Diagnostics;
        var d = Assert.Single(errors);
        Assert.Equal(C.SyntaxError, d.Code);
    }

    [Fact]
    public void A_declaration_that_failed_to_parse_is_not_reported_again_where_it_is_used()
    {
        var errors = Compile.Run("param L = 18 m +\nframe a\nframe b in a {\n origin at [L, 0, 0]\n}\nframe c in\nframe d in c\nreport d in a").Diagnostics;
        Assert.Equal([C.SyntaxError, C.SyntaxError], errors.Select(d => d.Code));
    }

    [Fact]
    public void Syntax_errors_explain_common_slips()
    {
        Assert.Contains("no implicit multiplication", Compile.Expect("param a = 2\nparam b = (3) a", C.SyntaxError, 2, 15).Message);
        Assert.Contains("order via, basis, as", Compile.Expect("frame a\nreport a in a basis a via a", C.SyntaxError, 2, 23).Message);
    }

    [Fact]
    public void Errors_come_sorted_by_position()
    {
        var errors = Compile.Run("param a = zz\nparam b = 1 ?\nparam c = yy").Diagnostics;
        Assert.Equal(errors.OrderBy(d => d.Span.Start).Select(d => d.Span.Start), errors.Select(d => d.Span.Start));
        Assert.Equal(3, errors.Count);
    }
}
