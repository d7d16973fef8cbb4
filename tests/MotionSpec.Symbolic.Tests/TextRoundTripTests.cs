using CsCheck;
using MotionSpec.Compiler;
using MotionSpec.Symbolic;

namespace MotionSpec.Symbolic.Tests;

/// <summary>
/// Text printed by the engine is spec syntax: written as a param definition and read back through the real
/// front end (tokenizer, parser, binder, lowering), it gives the very same node. The front end builds the
/// expression in its own order (left to right, unary minus first), so this also checks that the canonical
/// form does not depend on how an expression was put together.
/// </summary>
public class TextRoundTripTests
{
    // Free params stand in for the generator's symbols, so every sum is dimensionally legal in the language.
    private static readonly Dictionary<Symbol, Expr> AsParams = new()
    {
        [Symbol.Time] = Symbol.Param("C"),
        [Symbol.Coord("q")] = Symbol.Param("A"),
        [Symbol.Coord("q", 1)] = Symbol.Param("D"),
        [Symbol.Coord("s")] = Symbol.Param("B"),
    };

    private static readonly Symbol A = Symbol.Param("A");
    private static readonly Symbol B = Symbol.Param("B");
    private static readonly Symbol C = Symbol.Param("C");
    private static readonly Symbol D = Symbol.Param("D");

    private static Expr ReadBack(string text)
    {
        var spec = $"param L = 1.3\nparam A = 0.7\nparam B = -0.4\nparam C = 0.25\nparam D = 1.1\nparam R = {text}\n";
        var result = SpecCompiler.Check("roundtrip.motion", spec);
        Assert.False(result.HasErrors, text + Environment.NewLine + string.Join(Environment.NewLine, result.Diagnostics.Select(d => d.Message)));
        return result.Model!.Parameters[^1].Definition;
    }

    [Fact]
    public void Printed_text_read_back_by_the_front_end_is_the_same_expression()
    {
        RandomExpressions.Expression.Sample(
            e =>
            {
                var original = Substitution.Apply(e, AsParams);
                var text = TextPrinter.Print(original);
                var back = ReadBack(text);
                Assert.True(ReferenceEquals(original, back), $"{text} read back as {TextPrinter.Print(back)}");

                // Value as well, so a failure of the structural check above cannot hide behind equal printing.
                var random = new Random(text.Length);
                for (var i = 0; i < 3; i++)
                {
                    var values = new Dictionary<string, double>();
                    double ValueOf(Symbol s) => values.TryGetValue(s.Name, out var v) ? v : values[s.Name] = (random.NextDouble() * 3) - 1.5;
                    var expected = Evaluator.Evaluate(original, ValueOf).Value;
                    var actual = Evaluator.Evaluate(back, ValueOf).Value;
                    Assert.True(RandomExpressions.Close(expected, actual, 1e-9), $"{text}: {expected:R} read back as {actual:R}");
                }
            },
            iter: 150);
    }

    [Theory]
    [InlineData("-L^2")]
    [InlineData("(-L)^2")]
    [InlineData("2^-1 * L")]
    [InlineData("L^(1/2) + A^-2 - 3/5 * pi")]
    [InlineData("atan2(A, B) + sin(-L) * cos(-A)")]
    [InlineData("-(A + B) * C")]
    [InlineData("2 * (A + B) * C")]
    [InlineData("(A + B) / 3")]
    [InlineData("-(A)^2")]
    [InlineData("(2 * A + 4 * B)^2 * C")]
    [InlineData("sin(-(A + B))")]
    [InlineData("C / (2 * A + 2)")]
    [InlineData("(A / 2 + B) * sin(C)")]
    public void Written_forms_survive_print_and_read(string written)
    {
        var once = ReadBack(written);
        Assert.Same(once, ReadBack(TextPrinter.Print(once)));
    }

    /// <summary>
    /// Each pair is one value written two ways that differ only in where a number sits relative to a sum;
    /// the canonical form must not tell them apart.
    /// </summary>
    [Theory]
    [InlineData("-(A + B) * C", "(-A - B) * C")]
    [InlineData("-(A + B) * C", "-(C * (A + B))")]
    [InlineData("2 * (A + B) * C", "(2 * A + 2 * B) * C")]
    [InlineData("2 * (A + B) * C", "C * (A + B) * 2")]
    [InlineData("(A + B) / 3", "A / 3 + B / 3")]
    [InlineData("-(A)^2", "-(A^2)")]
    [InlineData("(-A - B)^2 * C", "(A + B)^2 * C")]
    [InlineData("(2 * A + 2 * B)^3", "8 * (A + B)^3")]
    [InlineData("((A + B) * 2)^2 * C", "4 * C * (A + B)^2")]
    [InlineData("sin(-(A + B))", "-sin(A + B)")]
    [InlineData("cos(1 - A) * B", "cos(A - 1) * B")]
    [InlineData("C / (2 * A + 2)", "C / 2 / (A + 1)")]
    [InlineData("(A / 2 + B) * sin(C)", "(A + 2 * B) * sin(C) / 2")]
    public void One_value_written_two_ways_is_one_node(string first, string second)
    {
        Assert.Same(ReadBack(first), ReadBack(second));
    }

    [Fact]
    public void A_number_times_a_product_holding_a_sum_keeps_the_sum_whole()
    {
        var e = -((A + B) * C);
        Assert.Same(e, (-(A + B)) * C);
        Assert.Equal("-C*(A + B)", TextPrinter.Print(e));
        Assert.Equal("-A - B", TextPrinter.Print(-(A + B)));
        Assert.Equal("2*C*(A + 2*B)", TextPrinter.Print(((Expr.Number(2) * A) + (Expr.Number(4) * B)) * C));
        Assert.Equal("D*(A + B)^2", TextPrinter.Print(D * Expr.Pow(-A - B, 2)));
    }
}
