using MotionSpec.Derivation.Naming;
using MotionSpec.Derivation.Tests.Support;
using MotionSpec.Derivation.Text;
using MotionSpec.Kinematics;
using MotionSpec.Symbolic;

namespace MotionSpec.Derivation.Tests;

/// <summary>The closed forms the derivation prints, against forms from outside the project, exactly.</summary>
public class TextbookFormTests
{
    private static readonly Symbol Theta = Symbol.Coord("theta");
    private static readonly Symbol ThetaDot = Symbol.Coord("theta", 1);
    private static readonly Symbol ThetaDdot = Symbol.Coord("theta", 2);

    [Fact]
    public void Spot_on_a_turntable_has_minus_w_squared_r_inwards_and_alpha_r_along_the_tangent()
    {
        var printed = Printed(Specs.Turntable, "spotInGroundBasisDisc");
        var r = Symbol.Param("R");

        // Common practice: a point fixed at radius r on a disc turning at w, with angular acceleration alpha,
        // accelerates by -w^2 r along the radius and alpha r along the tangent (disc basis: x radial, y tangential).
        AssertExactly(printed[Quantity.Centripetal], -(r * Expr.Pow(ThetaDot, 2)), Expr.Zero, Expr.Zero);
        AssertExactly(printed[Quantity.Angular], Expr.Zero, r * ThetaDdot, Expr.Zero);
        AssertExactly(printed[Quantity.Acceleration], -(r * Expr.Pow(ThetaDot, 2)), r * ThetaDdot, Expr.Zero);
        AssertExactly(printed[Quantity.Coriolis], Expr.Zero, Expr.Zero, Expr.Zero);
        AssertExactly(printed[Quantity.Relative], Expr.Zero, Expr.Zero, Expr.Zero);
        AssertExactly(printed[Quantity.Origin], Expr.Zero, Expr.Zero, Expr.Zero);
        AssertNoTrigonometry(printed);
    }

    [Fact]
    public void Slider_on_a_turning_rod_has_the_polar_radial_and_transverse_forms()
    {
        var printed = Printed(Specs.SliderOnRod, "sliderInGroundViaRodBasisRod");
        var r = Symbol.Coord("r");
        var rDot = Symbol.Coord("r", 1);
        var rDdot = Symbol.Coord("r", 2);

        // Polar-coordinate kinematics (any dynamics textbook): radial r'' - r theta'^2, transverse r theta'' + 2 r' theta'.
        AssertExactly(printed[Quantity.Acceleration], rDdot - (r * Expr.Pow(ThetaDot, 2)), (r * ThetaDdot) + (2 * rDot * ThetaDot), Expr.Zero);
        // The same split term by term: relative r'', centripetal -r theta'^2, angular r theta'', Coriolis 2 r' theta'.
        AssertExactly(printed[Quantity.Relative], rDdot, Expr.Zero, Expr.Zero);
        AssertExactly(printed[Quantity.Centripetal], -(r * Expr.Pow(ThetaDot, 2)), Expr.Zero, Expr.Zero);
        AssertExactly(printed[Quantity.Angular], Expr.Zero, r * ThetaDdot, Expr.Zero);
        AssertExactly(printed[Quantity.Coriolis], Expr.Zero, 2 * rDot * ThetaDot, Expr.Zero);
        AssertExactly(printed[Quantity.Velocity], rDot, r * ThetaDot, Expr.Zero);
        AssertNoTrigonometry(printed);
    }

    [Fact]
    public void Rover_body_rates_are_the_yaw_pitch_roll_kinematic_equations()
    {
        var printed = Printed(Specs.RoverAttitude, "bodyInGroundBasisBody");
        var phi = Symbol.Coord("phi");
        var phiDot = Symbol.Coord("phi", 1);
        var psiDot = Symbol.Coord("psi", 1);

        // Flight-dynamics textbooks, from memory: p = phi' - psi' sin(theta),
        // q = theta' cos(phi) + psi' cos(theta) sin(phi), r = -theta' sin(phi) + psi' cos(theta) cos(phi).
        AssertExactly(
            printed[Quantity.AngularVelocity],
            phiDot - (psiDot * Expr.Sin(Theta)),
            (ThetaDot * Expr.Cos(phi)) + (psiDot * Expr.Cos(Theta) * Expr.Sin(phi)),
            -(ThetaDot * Expr.Sin(phi)) + (psiDot * Expr.Cos(Theta) * Expr.Cos(phi)));
    }

    [Fact]
    public void Body_rates_are_also_what_the_text_output_says()
    {
        var model = Specs.Model(Specs.RoverAttitude);
        var text = DerivationWriter.Write(model, "Rover attitude", DerivationFormat.Text);
        var line = text.Split('\n').Single(l => l.StartsWith("bodyInGroundBasisBody.angularVelocity = ", StringComparison.Ordinal));
        Assert.EndsWith(" in body", line, StringComparison.Ordinal);
        Assert.DoesNotContain("k1", text, StringComparison.Ordinal);
    }

    private static Dictionary<Quantity, Vector3Expr> Printed(string spec, string reportName)
    {
        var model = Specs.Model(spec);
        var named = NamedIntermediates.Find(ClosedFormTextWriter.Outputs(model.Reports), new SpecNames(model.Spec));
        Assert.Empty(named.Temporaries);
        var result = new Dictionary<Quantity, Vector3Expr>();
        var index = 0;
        foreach (var report in model.Reports)
        {
            foreach (var quantity in report.Quantities)
            {
                if (report.Name == reportName)
                {
                    result[quantity] = new Vector3Expr(named.Outputs[index], named.Outputs[index + 1], named.Outputs[index + 2]);
                }

                index += 3;
            }
        }

        Assert.NotEmpty(result);
        return result;
    }

    // Canonical forms make structural equality the test of "exactly"; the expected side is simplified the same way.
    private static void AssertExactly(Vector3Expr actual, Expr x, Expr y, Expr z)
    {
        Expr[] expected = [x, y, z];
        for (var axis = 0; axis < 3; axis++)
        {
            Assert.Equal(TextPrinter.Print(Simplifier.Simplify(expected[axis])), TextPrinter.Print(actual[axis]));
            Assert.True(Simplifier.Simplify(expected[axis]).Equals(actual[axis]), $"component {axis}: {actual[axis]}");
        }
    }

    private static void AssertNoTrigonometry(Dictionary<Quantity, Vector3Expr> printed)
    {
        foreach (var (quantity, vector) in printed)
        {
            foreach (var component in vector.Components)
            {
                var text = TextPrinter.Print(component);
                Assert.False(text.Contains("sin(", StringComparison.Ordinal) || text.Contains("cos(", StringComparison.Ordinal), $"{quantity}: {text}");
            }
        }
    }
}
