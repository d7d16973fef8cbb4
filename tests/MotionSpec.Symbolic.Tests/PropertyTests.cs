using CsCheck;
using MathNet.Numerics.Differentiation;
using MotionSpec.Symbolic;

namespace MotionSpec.Symbolic.Tests;

public class PropertyTests
{
    private const int Iterations = 300;

    // Five-point central differences from MathNet.Numerics (a reference library), accurate enough for 1e-6.
    private static readonly NumericalDerivative Differentiator = new(5, 2) { StepType = StepType.Absolute, StepSize = 1e-4 };
    private static readonly NumericalDerivative CoarseDifferentiator = new(5, 2) { StepType = StepType.Absolute, StepSize = 2e-4 };

    /// <summary>
    /// d/dt against numerical differentiation by MathNet.Numerics (NumericalDerivative, a reference library). Coordinates follow quadratic paths q(t) = a + b t + c t^2, so q' = b + 2 c t and q'' = 2 c.
    /// </summary>
    [Fact]
    public void TimeDerivativeAgreesWithMathNetNumericalDerivative()
    {
        int checkedCount = 0;
        Gen.Select(RandomExpressions.Expression, RandomExpressions.State).Sample((e, st) =>
        {
            var d = Differentiation.TimeDerivative(e);
            Assert.True(d.Succeeded);
            double t0 = st[0] * 0.5;
            double length = st[1];
            double[] path = [st[2], st[3], st[4] * 0.5, st[5], st[6], st[7] * 0.5];

            Func<Symbol, double> At(double t) => s => s switch
            {
                { Kind: SymbolKind.Time } => t,
                { Name: "L" } => length,
                { Name: "q" } => Path(path, 0, s.Order, t),
                { Name: "s" } => Path(path, 3, s.Order, t),
                _ => double.NaN,
            };

            double F(double t) => Evaluator.Evaluate(e, At(t)).Value;
            double numeric = Differentiator.EvaluateDerivative(F, t0, 1);
            double coarse = CoarseDifferentiator.EvaluateDerivative(F, t0, 1);
            var symbolic = Evaluator.Evaluate(d.Value, At(t0));

            // Where two step sizes disagree the finite difference itself is unreliable (very steep functions).
            if (!symbolic.IsFinite || double.IsNaN(numeric) || !RandomExpressions.Close(numeric, coarse, 1e-8))
            {
                return true;
            }

            Interlocked.Increment(ref checkedCount);
            Assert.True(RandomExpressions.Close(symbolic.Value, numeric, 1e-6), $"{e} d/dt {d.Value}: {symbolic.Value} vs {numeric} at {t0}");
            return true;
        }, iter: Iterations);
        Assert.True(checkedCount > Iterations / 2, $"only {checkedCount} samples were numerically reliable");
    }

    private static double Path(double[] p, int at, int order, double t) => order switch
    {
        0 => p[at] + (p[at + 1] * t) + (p[at + 2] * t * t),
        1 => p[at + 1] + (2 * p[at + 2] * t),
        _ => 2 * p[at + 2],
    };

    [Fact]
    public void SimplificationKeepsValueAndNeverGrowsNodeCount()
    {
        Gen.Select(RandomExpressions.Expression, RandomExpressions.State).Sample((e, st) =>
        {
            var s = Simplifier.Simplify(e);
            if (ExprMetrics.NodeCount(s) > ExprMetrics.NodeCount(e))
            {
                return false;
            }

            var before = Evaluator.Evaluate(e, RandomExpressions.ValueOf(st));
            var after = Evaluator.Evaluate(s, RandomExpressions.ValueOf(st));
            return !before.IsFinite || RandomExpressions.Close(before.Value, after.Value, 1e-9);
        }, iter: Iterations);
    }

    /// <summary>
    /// The simplifier remembers what shared nodes became; the result must not depend on what it remembers
    /// or on the order outputs are simplified in.
    /// </summary>
    [Fact]
    public void SimplificationDoesNotDependOnWhatWasSimplifiedBefore()
    {
        Gen.Select(RandomExpressions.Expressions(2, 5), Gen.Int).Sample((outputs, seed) =>
        {
            var shared = outputs.Select(o => o * outputs[0]).ToArray();
            Simplifier.ForgetRemembered();
            var alone = shared.Select(o =>
            {
                Simplifier.ForgetRemembered();
                return Simplifier.Simplify(o);
            }).ToArray();
            var order = Enumerable.Range(0, shared.Length).ToArray();
            new Random(seed).Shuffle(order);
            Simplifier.ForgetRemembered();
            var together = new Expr[shared.Length];
            foreach (int i in order)
            {
                together[i] = Simplifier.Simplify(shared[i]);
            }

            for (int i = 0; i < shared.Length; i++)
            {
                Assert.Same(alone[i], together[i]);
                Assert.Same(alone[i], Simplifier.Simplify(shared[i]));
            }
        }, iter: 100);
    }

    [Fact]
    public void SimplifyingTwiceChangesNothing()
    {
        RandomExpressions.Expression.Sample(e =>
        {
            var once = Simplifier.Simplify(e);
            return ExprMetrics.NodeCount(Simplifier.Simplify(once)) <= ExprMetrics.NodeCount(once);
        }, iter: Iterations);
    }

    [Fact]
    public void SumsAndProductsDoNotDependOnOperandOrder()
    {
        Gen.Select(RandomExpressions.Expressions(1, 8), Gen.Int).Sample((terms, seed) =>
        {
            var shuffled = (Expr[])terms.Clone();
            new Random(seed).Shuffle(shuffled);
            Assert.Same(Expr.Sum(terms), Expr.Sum(shuffled));
            Assert.Same(Expr.Product(terms), Expr.Product(shuffled));
            Assert.Same(terms.Aggregate((a, b) => a + b), shuffled.Aggregate((a, b) => b + a));
        }, iter: Iterations);
    }

    /// <summary>
    /// Grouping and where a number is applied must not matter: (a*b)*c = a*(b*c), (k*a)*b = k*(a*b),
    /// (a + b) + c = a + (b + c), and an integer power of a product is the product of the powers.
    /// </summary>
    [Fact]
    public void GroupingAndNumericFactorsDoNotChangeTheForm()
    {
        var k = Gen.Int[-4, 4].Where(n => n != 0).Select(Gen.Int[1, 3], (n, d) => Expr.Number(new Rational(n, d)));
        Gen.Select(RandomExpressions.Expressions(3, 3), k).Sample((e, c) =>
        {
            var (a, b, d) = (e[0], e[1], e[2]);
            Assert.Same((a * b) * d, a * (b * d));
            Assert.Same((c * a) * b, c * (a * b));
            Assert.Same(a * (c * b), (a * b) * c);
            Assert.Same(-(a * b), (-a) * b);
            Assert.Same((a + b) + d, a + (b + d));
            Assert.Same((c * a) + (c * b), c * (a + b));
            Assert.Same(Expr.Pow(c * a * b, 2), c * c * Expr.Pow(a, 2) * Expr.Pow(b, 2));
        }, iter: Iterations);
    }

    [Fact]
    public void CanonicalisationIsIdempotent()
    {
        RandomExpressions.Expression.Sample(e => Assert.Same(e, Recanonicalise(e)), iter: Iterations);
    }

    /// <summary>Rebuilds every node through the public constructors from its own parts.</summary>
    private static Expr Recanonicalise(Expr e) => e switch
    {
        Sum s => Expr.Sum(s.Terms.Select(Recanonicalise)),
        Product p => Expr.Product(p.Factors.Select(Recanonicalise)),
        Power pw => Expr.Pow(Recanonicalise(pw.Base), pw.Exponent),
        Call c => Expr.Call(c.Function, [.. c.Arguments.Select(Recanonicalise)]),
        _ => e,
    };

    [Fact]
    public void CommonSubexpressionProgramEvaluatesToTheSameValues()
    {
        Gen.Select(RandomExpressions.Expressions(1, 4), RandomExpressions.State).Sample((outputs, st) =>
        {
            var program = CommonSubexpressions.Eliminate(outputs);
            var valueOf = RandomExpressions.ValueOf(st);
            var temps = new Dictionary<Symbol, double>();
            foreach (var t in program.Temporaries)
            {
                temps[t.Name] = Evaluator.Evaluate(t.Value, s => temps.TryGetValue(s, out var v) ? v : valueOf(s)).Value;
            }

            for (int i = 0; i < outputs.Length; i++)
            {
                var expected = Evaluator.Evaluate(outputs[i], valueOf);
                var actual = Evaluator.Evaluate(program.Outputs[i], s => temps.TryGetValue(s, out var v) ? v : valueOf(s));
                if (expected.IsFinite && !RandomExpressions.Close(expected.Value, actual.Value, 1e-12))
                {
                    return false;
                }
            }

            return true;
        }, iter: Iterations);
    }

    [Fact]
    public void EvaluationPlanAgreesWithEvaluatorBitForBit()
    {
        Symbol[] inputs =
        [
            Symbol.Time, RandomExpressions.L, RandomExpressions.Q, RandomExpressions.QDot, RandomExpressions.QDdot,
            RandomExpressions.S, RandomExpressions.SDot, RandomExpressions.SDdot,
        ];
        Gen.Select(RandomExpressions.Expressions(1, 4), RandomExpressions.State).Sample((outputs, st) =>
        {
            var plan = EvaluationPlan.Compile(outputs, inputs);
            var values = new double[plan.OutputCount];
            plan.Evaluate(st.AsSpan(0, 8), values);
            for (int i = 0; i < outputs.Length; i++)
            {
                var expected = Evaluator.Evaluate(outputs[i], RandomExpressions.ValueOf(st)).Value;
                if (!expected.Equals(values[i]))
                {
                    return false;
                }
            }

            return true;
        }, iter: Iterations);
    }
}
