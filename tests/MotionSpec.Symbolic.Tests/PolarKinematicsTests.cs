using MotionSpec.Symbolic;

namespace MotionSpec.Symbolic.Tests;

/// <summary>
/// A bead sliding along a turning rod: position [r cos(theta), r sin(theta)], both r and theta coordinates.
/// Projected on the turning basis, the acceleration is radial r'' - r*theta'^2 and transverse
/// r*theta'' + 2*r'*theta' (polar-coordinate kinematics, any dynamics textbook).
/// </summary>
public class PolarKinematicsTests
{
    private static readonly Symbol R = Symbol.Coord("r");
    private static readonly Symbol Theta = Symbol.Coord("theta");

    private static (Expr X, Expr Y) Acceleration()
    {
        Expr x = R * Expr.Cos(Theta);
        Expr y = R * Expr.Sin(Theta);
        for (int i = 0; i < 2; i++)
        {
            x = Differentiation.TimeDerivative(x).Value;
            y = Differentiation.TimeDerivative(y).Value;
        }

        return (x, y);
    }

    [Fact]
    public void RadialComponentSimplifiesExactly()
    {
        var (ax, ay) = Acceleration();
        var radial = Simplifier.Simplify((ax * Expr.Cos(Theta)) + (ay * Expr.Sin(Theta)));
        var expected = R.WithOrder(2) - (R * Expr.Pow(Theta.WithOrder(1), 2));
        Assert.Same(expected, radial);
        Assert.Equal("r'' - r*theta'^2", radial.ToString());
    }

    [Fact]
    public void TransverseComponentSimplifiesExactly()
    {
        var (ax, ay) = Acceleration();
        var transverse = Simplifier.Simplify((-ax * Expr.Sin(Theta)) + (ay * Expr.Cos(Theta)));
        var expected = (R * Theta.WithOrder(2)) + (Expr.Number(2) * R.WithOrder(1) * Theta.WithOrder(1));
        Assert.Same(expected, transverse);
        Assert.Equal("r*theta'' + 2*r'*theta'", transverse.ToString());
    }
}
