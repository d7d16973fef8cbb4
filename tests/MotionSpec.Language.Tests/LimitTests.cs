using MotionSpec.Language.Diagnostics;

namespace MotionSpec.Language.Tests;

public class LimitTests
{
    private static string Parens(int depth) => "param a = " + new string('(', depth) + "1" + new string(')', depth) + "\n";

    [Fact]
    public void Nesting_at_the_limit_is_accepted()
    {
        Compile.Clean(Parens(Limits.ExpressionNesting));
        Compile.Clean("param a = " + string.Concat(Enumerable.Repeat("-", Limits.ExpressionNesting)) + "1\n");
        Compile.Clean("param a = 1" + string.Concat(Enumerable.Repeat("^1", Limits.ExpressionNesting)) + "\n");
        Compile.Clean("param a = " + string.Concat(Enumerable.Repeat("sin(", Limits.ExpressionNesting)) + "1" + new string(')', Limits.ExpressionNesting) + "\n");
    }

    [Fact]
    public void Nesting_beyond_the_limit_is_one_located_error()
    {
        var d = Compile.Expect("param b = 2\n" + Parens(Limits.ExpressionNesting + 1), LanguageDiagnosticCodes.NestingTooDeep, 2, 11 + Limits.ExpressionNesting);
        Assert.Contains("256", d.Message);
    }

    [Fact]
    public void Very_deep_input_never_overflows_the_stack()
    {
        foreach (var text in new[]
        {
            Parens(50_000),
            "param a = " + new string('-', 50_000) + "1",
            "param a = 1" + string.Concat(Enumerable.Repeat("^1", 50_000)),
            "frame f\npoint p in f at " + new string('[', 50_000),
        })
        {
            var errors = Compile.Run(text).Diagnostics;
            Assert.Contains(errors, d => d.Code == LanguageDiagnosticCodes.NestingTooDeep);
        }
    }

    [Fact]
    public void Long_sums_up_to_the_operator_limit_bind()
    {
        var sum = "param a = 1" + string.Concat(Enumerable.Repeat(" + 1", Limits.OperatorsPerStatement)) + "\n";
        var spec = Compile.Clean(sum);
        Assert.Equal(Limits.OperatorsPerStatement + 1, spec.Parameters[0].Value);
        Compile.Expect(sum.Replace("= 1", "= 1 + 1"), LanguageDiagnosticCodes.StatementTooLong, 1, 13 + (4 * Limits.OperatorsPerStatement));
    }
}
