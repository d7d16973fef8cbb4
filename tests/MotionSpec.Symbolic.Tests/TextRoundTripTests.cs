using CsCheck;
using MotionSpec.Compiler;
using MotionSpec.Symbolic;

namespace MotionSpec.Symbolic.Tests;

/// <summary>
/// Text printed by the engine is spec syntax: written as a param definition and read back through the real
/// front end (tokenizer, parser, binder, lowering), it gives the same expression. For random trees the test
/// compares values at random points: the canonical form is not yet unique under rebuilding (a number times a
/// product that holds a sum is multiplied out only when written as number times the sum), so two readings of
/// one text can differ in shape while agreeing in value. Written forms are compared structurally.
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
                var random = new Random(text.Length);
                for (var i = 0; i < 5; i++)
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
    public void Written_forms_survive_print_and_read(string written)
    {
        var once = ReadBack(written);
        Assert.Equal(once, ReadBack(TextPrinter.Print(once)));
    }
}
