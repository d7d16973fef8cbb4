using MotionSpec.Symbolic;

namespace MotionSpec.Kinematics.Frames;

/// <summary>Componentwise d/dt with results remembered, recording an unavailable derivative instead of failing.</summary>
internal sealed class TimeDerivatives(DerivationIssues issues)
{
    private readonly Dictionary<Expr, Expr> _cache = [];

    public Expr Of(Expr e)
    {
        if (e.IsConstant)
        {
            return Expr.Zero;
        }

        if (_cache.TryGetValue(e, out var known))
        {
            return known;
        }

        var result = Differentiation.TimeDerivative(e);
        if (!result.Succeeded)
        {
            if (result.MissingDerivativeOf is { } symbol)
            {
                issues.NeedDerivativeOf(symbol);
            }

            return Expr.Zero;
        }

        _cache[e] = result.Value;
        return result.Value;
    }

    public Vector3Expr Of(Vector3Expr v) => new(Of(v.X), Of(v.Y), Of(v.Z));
}
