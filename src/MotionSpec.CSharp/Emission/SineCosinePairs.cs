using MotionSpec.Symbolic;

namespace MotionSpec.CSharp.Emission;

/// <summary>
/// Finds the temporaries that are the sine and the cosine of the same argument, so that both come from one
/// Math.SinCos call: it shares the argument reduction and costs about two thirds of the two calls it replaces,
/// and for a chain of revolute links the trigonometric calls are most of an evaluator's time.
/// </summary>
internal static class SineCosinePairs
{
    /// <summary>For each sine or cosine whose partner is also a temporary: the sine and the cosine, in that order.</summary>
    public static IReadOnlyDictionary<Symbol, (Temporary Sine, Temporary Cosine)> Find(IEnumerable<Temporary> temporaries)
    {
        var sines = new Dictionary<Expr, Temporary>();
        var cosines = new Dictionary<Expr, Temporary>();
        foreach (var temporary in temporaries)
        {
            switch (temporary.Value)
            {
                case Call { Function: Function.Sin } sine:
                    sines[sine.Arguments[0]] = temporary;
                    break;
                case Call { Function: Function.Cos } cosine:
                    cosines[cosine.Arguments[0]] = temporary;
                    break;
            }
        }

        var pairs = new Dictionary<Symbol, (Temporary Sine, Temporary Cosine)>();
        foreach (var sine in sines)
        {
            if (cosines.TryGetValue(sine.Key, out var cosine))
            {
                pairs[sine.Value.Name] = (sine.Value, cosine);
                pairs[cosine.Name] = (sine.Value, cosine);
            }
        }

        return pairs;
    }
}
