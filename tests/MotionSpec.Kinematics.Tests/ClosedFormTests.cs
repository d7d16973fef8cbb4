using MotionSpec.Symbolic;
using static MotionSpec.Kinematics.Tests.SpecFixture;

namespace MotionSpec.Kinematics.Tests;

/// <summary>The closed forms the trade knows, derived exactly from specs.</summary>
public class ClosedFormTests
{
    private const string TurningRod = """
        coord theta : angle
        coord r : length
        frame ground
        frame rod in ground {
            rotate about z by theta
        }
        point bead in rod at [r, 0, 0]
        report bead in ground basis rod
        """;

    [Fact]
    public void Bead_on_a_turning_rod_gives_the_polar_form_in_the_rod_basis()
    {
        // Polar-coordinate kinematics (any dynamics textbook): radial r'' - r theta'^2, transverse r theta'' + 2 r' theta'.
        var report = Report(Model(TurningRod), "beadInGroundBasisRod");
        Expr r = Coord("r"), rd = Coord("r", 1), rdd = Coord("r", 2), th = Coord("theta", 1), thdd = Coord("theta", 2);
        var two = Expr.Number(2);

        Assert.Equal(new Vector3Expr(rdd, Expr.Zero, Expr.Zero), report[Quantity.Relative]);
        Assert.Equal(new Vector3Expr(-(r * th * th), Expr.Zero, Expr.Zero), report[Quantity.Centripetal]);
        Assert.Equal(new Vector3Expr(Expr.Zero, r * thdd, Expr.Zero), report[Quantity.Angular]);
        Assert.Equal(new Vector3Expr(Expr.Zero, two * rd * th, Expr.Zero), report[Quantity.Coriolis]);
        Assert.Equal(Vector3Expr.Zero, report[Quantity.Origin]);
        Assert.Equal(new Vector3Expr(rdd - (r * th * th), (r * thdd) + (two * rd * th), Expr.Zero), report[Quantity.Acceleration]);
    }

    [Fact]
    public void Point_on_a_turning_disc_has_centripetal_and_tangential_parts()
    {
        // Common practice: a point fixed at radius R on a disc turning at w = theta' has -w^2 R towards the centre
        // and alpha R = theta'' R along the tangent.
        var model = Model("""
            param R = 0.4 m
            coord theta : angle
            frame ground
            frame disc in ground {
                rotate about z by theta
            }
            point rim in disc at [R, 0, 0]
            report rim in ground basis disc
            """);
        var report = Report(model, "rimInGroundBasisDisc");
        Expr radius = Param("R"), w = Coord("theta", 1), alpha = Coord("theta", 2);
        Assert.Equal(new Vector3Expr(-(radius * w * w), radius * alpha, Expr.Zero), report[Quantity.Acceleration]);
        Assert.Equal(Vector3Expr.Zero, report[Quantity.Relative]);
        Assert.Equal(Vector3Expr.Zero, report[Quantity.Coriolis]);
    }

    [Theory]
    [InlineData("""
        coord psi : angle
        coord theta : angle
        coord phi : angle
        frame ground
        frame body in ground {
            rotate about z by psi
            rotate about y by theta
            rotate about x by phi
        }
        report body in ground basis body
        """)]
    [InlineData("""
        coord psi : angle
        coord theta : angle
        coord phi : angle
        frame ground
        frame yawed in ground {
            rotate about z by psi
        }
        frame pitched in yawed {
            rotate about y by theta
        }
        frame body in pitched {
            rotate about x by phi
        }
        report body in ground basis body
        """)]
    public void Yaw_pitch_roll_rates_give_the_body_rates(string spec)
    {
        // Flight-dynamics textbooks (from memory): p = phi' - psi' sin(theta),
        // q = theta' cos(phi) + psi' cos(theta) sin(phi), r = -theta' sin(phi) + psi' cos(theta) cos(phi).
        var report = Report(Model(spec), "bodyInGroundBasisBody");
        Expr psi = Coord("psi", 1), theta = Coord("theta"), thetaRate = Coord("theta", 1), phi = Coord("phi"), phiRate = Coord("phi", 1);
        var expected = new Vector3Expr(
            phiRate - (psi * Expr.Sin(theta)),
            (thetaRate * Expr.Cos(phi)) + (psi * Expr.Cos(theta) * Expr.Sin(phi)),
            -(thetaRate * Expr.Sin(phi)) + (psi * Expr.Cos(theta) * Expr.Cos(phi)));
        var actual = report[Quantity.AngularVelocity];
        for (var i = 0; i < 3; i++)
        {
            Assert.Equal(Simplifier.Simplify(expected[i]), actual[i]);
        }
    }

    [Fact]
    public void Rotations_about_one_axis_are_merged_before_a_matrix_is_formed()
    {
        // Two turns about z by a and b are one turn by a + b (common practice), so the link has one matrix entry cos(a + b).
        var model = Model("""
            coord a : angle
            coord b : angle
            frame ground
            frame f in ground {
                rotate about z by a
                rotate about z by b
            }
            """);
        var frame = model.Frames.Single(f => f.Frame.Name == "f");
        Assert.Equal(Expr.Cos(Coord("a") + Coord("b")), frame.Orientation![0, 0]);
        Assert.Equal(new Vector3Expr(Expr.Zero, Expr.Zero, Coord("a", 1) + Coord("b", 1)), frame.AngularVelocity);
    }

    [Fact]
    public void Rotation_follows_the_language_sign_convention()
    {
        // After rotate about z by q, F.x = cos q P.x + sin q P.y: the first column of the matrix is (cos q, sin q, 0).
        var model = Model("""
            coord q : angle
            frame p
            frame f in p {
                rotate about z by q
            }
            """);
        var m = model.Frames.Single(f => f.Frame.Name == "f").Orientation!;
        Assert.Equal(Expr.Cos(Coord("q")), m[0, 0]);
        Assert.Equal(Expr.Sin(Coord("q")), m[1, 0]);
        Assert.Equal(-Expr.Sin(Coord("q")), m[0, 1]);
    }
}
