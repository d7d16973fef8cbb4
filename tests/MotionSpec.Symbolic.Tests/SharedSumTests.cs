using MotionSpec.Symbolic;

namespace MotionSpec.Symbolic.Tests;

/// <summary>
/// Canonical sums are flat, so a sum added into a larger one is no longer a node of it. CSE shares such partial
/// sums once they are temporaries: a later sum that holds all of a temporary's terms, or all of their negations,
/// uses the temporary.
/// </summary>
public class SharedSumTests
{
    private static readonly Symbol A = Symbol.Coord("a");
    private static readonly Symbol B = Symbol.Coord("b");
    private static readonly Symbol C = Symbol.Coord("c");
    private static readonly Symbol D = Symbol.Coord("d");
    private static readonly Symbol X = Symbol.Coord("x");
    private static readonly Symbol Y = Symbol.Coord("y");

    [Fact]
    public void ALargerSumUsesTheTemporaryOfTheSumItContains()
    {
        // w = a + b is used twice as a whole, and w + d is a flat sum of its terms and d.
        var w = A + B;
        var program = CommonSubexpressions.Eliminate([X * w, Y * w, w + D]);

        var temporary = Assert.Single(program.Temporaries, t => t.Value.Equals(w));
        Assert.Equal(temporary.Name + D, program.Outputs[2]);
    }

    [Fact]
    public void ANegatedPartialSumIsSharedWithItsSign()
    {
        var w = A + B;
        var program = CommonSubexpressions.Eliminate([X * w, Y * w, D - w]);

        var temporary = Assert.Single(program.Temporaries, t => t.Value.Equals(w));
        Assert.Equal(D - temporary.Name, program.Outputs[2]);
    }

    [Fact]
    public void ASumMissingOneOfTheTermsIsLeftAsItIs()
    {
        var w = A + B;
        var program = CommonSubexpressions.Eliminate([X * w, Y * w, A + D]);

        Assert.Same(A + D, program.Outputs[2]);
    }

    [Fact]
    public void SharingKeepsTheValue()
    {
        // Random values, compared with the plain evaluator (the program's temporaries substituted back).
        var w = A + (B * C) - Expr.Sin(D);
        var outputs = new[] { X * w, w + (Y * Y), (3 * X) - w + A, D - w - (B * C) };
        var program = CommonSubexpressions.Eliminate(outputs);
        var random = new Random(5);
        for (var trial = 0; trial < 20; trial++)
        {
            var values = new Dictionary<Symbol, double>
            {
                [A] = random.NextDouble(), [B] = random.NextDouble(), [C] = random.NextDouble(),
                [D] = random.NextDouble(), [X] = random.NextDouble(), [Y] = random.NextDouble(),
            };
            foreach (var temporary in program.Temporaries)
            {
                values[temporary.Name] = Evaluator.Evaluate(temporary.Value, s => values[s]).Value;
            }

            for (var i = 0; i < outputs.Length; i++)
            {
                var expected = Evaluator.Evaluate(outputs[i], s => values[s]).Value;
                var actual = Evaluator.Evaluate(program.Outputs[i], s => values[s]).Value;
                Assert.Equal(expected, actual, 1e-14);
            }
        }
    }
}
