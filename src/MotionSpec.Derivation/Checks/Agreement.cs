using System.Globalization;
using MotionSpec.Kinematics;
using MotionSpec.Symbolic;

namespace MotionSpec.Derivation.Checks;

/// <summary>The outcome of comparing closed forms: the method, states used and the worst relative difference.</summary>
internal sealed record Agreement(AgreementMethod Method, int States, double WorstRelativeError, string? Reason = null)
{
    /// <summary>How many random states a numeric comparison tries.</summary>
    public const int StateCount = 24;

    /// <summary>Largest relative difference accepted as agreement (rounding of long closed forms stays far below).</summary>
    public const double Tolerance = 1e-9;

    public bool Passed => Method is AgreementMethod.Symbolic or AgreementMethod.Numeric;

    /// <summary>A sentence for the derivation, such as "checked symbolically: every difference simplifies to zero".</summary>
    public string Describe() => Method switch
    {
        AgreementMethod.Symbolic => "checked symbolically: the difference of every component simplifies to exactly zero",
        AgreementMethod.Numeric => string.Create(
            CultureInfo.InvariantCulture,
            $"checked numerically: the two agree at {States} random states (largest relative difference {WorstRelativeError:0.###e+0}, tolerance {Tolerance:0e+0})"),
        AgreementMethod.Disagree => string.Create(
            CultureInfo.InvariantCulture,
            $"CHECK FAILED: the two differ at a random state (relative difference {WorstRelativeError:0.###e+0}); do not use these results and report the spec"),
        _ => "not checked: " + (Reason ?? "no independent form is available"),
    };

    /// <summary>Differences up to this many distinct nodes are also tried symbolically; larger ones only at random states.</summary>
    public const int SymbolicNodeLimit = 600;

    /// <summary>
    /// Compares pairs of expressions: at random states first (cheap, and it catches any disagreement), then,
    /// when the differences are small enough to simplify quickly, symbolically, so that the derivation can say
    /// "exactly zero" where that was shown. The relative difference is |a - b| / max(scale, 1e-12), scale the
    /// largest magnitude on either side among the pairs at that state.
    /// </summary>
    public static Agreement Compare(KinematicModel model, IReadOnlyList<(Expr A, Expr B)> pairs, int seed)
    {
        var numeric = CompareAtRandomStates(model, pairs, seed);
        if (numeric.Method == AgreementMethod.Disagree)
        {
            return numeric;
        }

        var differences = pairs.Select(p => p.A - p.B).ToList();
        if (ExprMetrics.NodeCount(differences) <= SymbolicNodeLimit && differences.All(d => Simplifier.Simplify(d).IsZero))
        {
            return new Agreement(AgreementMethod.Symbolic, 0, 0);
        }

        return numeric;
    }

    private static Agreement CompareAtRandomStates(KinematicModel model, IReadOnlyList<(Expr A, Expr B)> pairs, int seed)
    {
        var sampler = new StateSampler(model, seed);
        var states = 0;
        var worst = 0.0;
        for (var attempt = 0; attempt < 4 * StateCount && states < StateCount; attempt++)
        {
            var valueOf = sampler.Next();
            var a = pairs.Select(p => Evaluator.Evaluate(p.A, valueOf)).ToArray();
            var b = pairs.Select(p => Evaluator.Evaluate(p.B, valueOf)).ToArray();
            if (a.Any(r => !r.IsFinite) || b.Any(r => !r.IsFinite))
            {
                continue;
            }

            var scale = Math.Max(Math.Max(a.Max(r => Math.Abs(r.Value)), b.Max(r => Math.Abs(r.Value))), 1e-12);
            states++;
            for (var i = 0; i < pairs.Count; i++)
            {
                worst = Math.Max(worst, Math.Abs(a[i].Value - b[i].Value) / scale);
            }
        }

        if (states < StateCount / 2)
        {
            return new Agreement(AgreementMethod.NotChecked, states, worst, "the closed forms are not finite at enough random states");
        }

        return new Agreement(worst <= Tolerance ? AgreementMethod.Numeric : AgreementMethod.Disagree, states, worst);
    }
}
