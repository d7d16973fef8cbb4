using MotionSpec.Symbolic;
using static MotionSpec.Kinematics.Tests.SpecFixture;

namespace MotionSpec.Kinematics.Tests;

/// <summary>
/// The five terms add up to the acceleration, and the acceleration is the second time derivative of the position
/// (both taken in the observer's basis). The kinematics builds a point's acceleration as the sum of its terms,
/// each derived by the transport theorem part by part, so the first test guards that build and its
/// simplification; the independent route is the second, plain differentiation of the position's components.
/// </summary>
public class FiveTermTests
{
    public static TheoryData<string> Specs => new()
    {
        // A slewing boom with a trolley and a swinging hook; the terms taken relative to the trolley.
        """
        param L = 12 m
        param w = 0.5 rpm
        coord s : length
        coord swing : angle
        let yaw = w * t
        frame yard
        frame boom in yard {
            rotate about z by yaw
            origin at [0, 0, 30 m]
        }
        frame trolley in boom {
            origin at [s, 0, 0]
        }
        frame hook in trolley {
            rotate about x by swing
        }
        point load in hook at [0, 0, -L]
        report load in yard via trolley
        report load in yard via boom basis hook as loadInHook
        report load in trolley basis yard as loadFromTrolley
        report hook in yard basis hook
        """,
        // Observers on other branches, a tilted axis, a point path using two bases and a cross product.
        """
        coord a : angle
        coord b : angle
        coord c : length
        frame base
        frame arm in base {
            rotate about [1, 1, 0] by a
            rotate about y by 0.3
            origin at [0.5 m, 0, 0.2 m]
        }
        frame wrist in arm {
            rotate about z by b + 0.2 * t
            origin at [0, c, 0] + 0.1 * base.z
        }
        frame column in base {
            rotate about x by 2 * a
            origin at [0, 1 m, 0]
        }
        point tool in wrist at [c, 0, 0.05 m] + cross(arm.x, [0, 0, 0.1 m] in column)
        report tool in column via arm
        report tool in column via wrist basis base as toolSeenFromColumn
        report wrist in column basis arm
        """,
        // A spin frame (with no origin of its own, so that its offset stays on the parent's side) and legal reports.
        """
        coord p : angle
        coord q : angle
        coord yaw : angle
        frame ground
        frame mast in ground {
            rotate about z by yaw
        }
        frame mount in mast {
            origin at [0, 0, 1.5 m]
        }
        frame head in mount {
            spin [p', q', 0]
        }
        point lens in head at [0.1 m, 0, 0]
        report lens in mount basis head
        report head in mount basis head
        report mount in ground
        """,
        // A six-link boom, long enough that vectors cross it through one composed rotation matrix.
        """
        param a = 0.4 m
        coord q1 : angle
        coord q2 : angle
        coord q3 : angle
        coord q4 : angle
        coord q5 : angle
        coord q6 : angle
        coord s : length
        frame yard
        frame b1 in yard { rotate about z by q1 }
        frame b2 in b1 { rotate about y by q2 origin at [a, 0, 0] }
        frame b3 in b2 { rotate about [1, 0, 1] by q3 origin at [a + s, 0, 0] }
        frame b4 in b3 { rotate about z by q4 origin at [a, 0, 0] }
        frame b5 in b4 { rotate about y by q5 origin at [a, 0, 0] }
        frame b6 in b5 { rotate about z by q6 origin at [a, 0, 0.1 m] }
        point tool in b6 at [a + s, 0, 0]
        report tool in yard
        report tool in yard via b1
        report b6 in yard
        """,
    };

    [Theory]
    [MemberData(nameof(Specs))]
    public void Terms_add_up_to_the_acceleration(string spec)
    {
        var model = Model(spec);
        var random = new Random(7);
        foreach (var report in model.Reports.Where(r => r.Report.Kind == Language.Binding.ReportKind.Point))
        {
            for (var i = 0; i < 20; i++)
            {
                var state = RandomState(model, random);
                var sum = new double[3];
                foreach (var term in QuantityInfo.Terms)
                {
                    var v = Evaluate(report[term], state);
                    for (var k = 0; k < 3; k++)
                    {
                        sum[k] += v[k];
                    }
                }

                AssertClose(Evaluate(report[Quantity.Acceleration], state), sum, 1e-11);
            }
        }
    }

    [Theory]
    [MemberData(nameof(Specs))]
    public void Velocity_and_acceleration_are_derivatives_of_the_position_in_the_observer(string spec)
    {
        var model = Model(spec);
        var random = new Random(11);
        foreach (var report in model.Reports.Where(r => r.Report.Observer == r.Report.Basis))
        {
            var (position, velocity, acceleration) = report.Report.Kind == Language.Binding.ReportKind.Point
                ? (Quantity.Position, Quantity.Velocity, Quantity.Acceleration)
                : (Quantity.OriginPosition, Quantity.OriginVelocity, Quantity.OriginAcceleration);
            var rate = report[position].Map(Dt);
            var second = rate.Map(Dt);
            for (var i = 0; i < 20; i++)
            {
                var state = RandomState(model, random);
                AssertClose(Evaluate(rate, state), Evaluate(report[velocity], state), 1e-11);
                AssertClose(Evaluate(second, state), Evaluate(report[acceleration], state), 1e-11);
            }
        }
    }

    private static Expr Dt(Expr e) => Differentiation.TimeDerivative(e).Value;
}
