using MotionSpec.Compiler;

namespace MotionSpec.Kinematics.Tests;

/// <summary>Every MOT4 error with its exact location: the start of the report statement.</summary>
public class DiagnosticTests
{
    private static void AssertSingleError(string text, string code, int line, int column, string fragment)
    {
        var result = SpecCompiler.Check("test.motion", text);
        var error = Assert.Single(result.Diagnostics, d => d.IsError);
        Assert.Equal(code, error.Code);
        var position = result.Source!.GetLinePosition(error.Span.Start);
        Assert.Equal((line, column), (position.Line, position.Column));
        Assert.Contains(fragment, error.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void A_report_across_a_spin_frame_is_an_error_naming_it()
    {
        AssertSingleError(
            """
            coord a : angle
            coord yaw : angle
            frame quay
            frame hook in quay {
                rotate about z by yaw
            }
            frame imu in hook {
                spin [a', 0, 0]
            }
            point lens in imu at [0, 0, 0.05]
            report lens in hook basis imu
              report lens in quay
            """,
            KinematicsDiagnosticCodes.UnknownOrientation,
            12,
            3,
            "spin frame 'imu'");
    }

    [Fact]
    public void A_report_in_the_spin_frame_basis_with_a_turning_parent_is_an_error()
    {
        // The hook's own turn is known in the hook's basis, which the imu's unknown orientation separates from imu.
        AssertSingleError(
            """
            coord a : angle
            coord yaw : angle
            frame quay
            frame hook in quay {
                rotate about z by yaw
            }
            frame imu in hook {
                spin [a', 0, 0]
            }
            point lens in imu at [0, 0, 0.05]
            report lens in quay basis imu
            """,
            KinematicsDiagnosticCodes.UnknownOrientation,
            11,
            1,
            "'imu'");
    }

    [Fact]
    public void A_third_derivative_of_a_coord_is_an_error_at_the_report()
    {
        AssertSingleError(
            """
            coord q : length
            frame ground
            frame slide in ground
            point p in slide at [0.5 * q'', 0, 0]
                report p in ground
            """,
            KinematicsDiagnosticCodes.DerivativeNotAvailable,
            5,
            5,
            "third derivative of coord 'q'");
    }

    [Fact]
    public void A_spin_rate_needs_its_derivative_for_the_angular_acceleration()
    {
        AssertSingleError(
            """
            coord a : angle
            frame ground
            frame gyro in ground {
                spin [0, 0, 2 * a'']
            }
            report gyro in ground basis gyro
            """,
            KinematicsDiagnosticCodes.DerivativeNotAvailable,
            6,
            1,
            "'a'");
    }

    [Fact]
    public void A_basis_from_another_tree_is_an_error()
    {
        AssertSingleError(
            """
            frame left
            frame right
            frame arm in left
            point p in arm at [1 m, 0, 0] in right
            report p in left
            """,
            KinematicsDiagnosticCodes.UnrelatedTrees,
            5,
            1,
            "'right'");
    }

    [Fact]
    public void Every_kinematics_code_has_a_located_test_here()
    {
        var source = File.ReadAllText(Path.Combine(AppContext.BaseDirectory, "..", "..", "..", "DiagnosticTests.cs"));
        foreach (var (code, _) in KinematicsDiagnosticCodes.All)
        {
            var name = typeof(KinematicsDiagnosticCodes).GetFields().Single(f => (string?)f.GetValue(null) == code).Name;
            Assert.Contains("KinematicsDiagnosticCodes." + name + ",", source, StringComparison.Ordinal);
        }
    }
}
