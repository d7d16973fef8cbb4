using MotionSpec.Compiler;
using MotionSpec.Kinematics;

namespace MotionSpec.Derivation.Tests.Support;

/// <summary>The scenarios of the derivation tests, and the pipeline that checks them.</summary>
internal static class Specs
{
    // A spot on a turntable that turns by theta about its axis: the spot sits at radius R on the disc's x axis.
    public const string Turntable = """
        title "Spot on a turntable"
        param R = 0.4 m
        coord theta : angle
        frame ground
        frame disc in ground {
            rotate about z by theta
        }
        point spot in disc at [R, 0, 0]
        report spot in ground basis disc
        """;

    // A slider running along a rod that turns about the vertical; the slider's distance from the pivot is the coord r.
    public const string SliderOnRod = """
        title "Slider on a turning rod"
        coord theta : angle
        coord r : length
        frame ground
        frame rod in ground {
            rotate about z by theta
        }
        point slider in rod at [r, 0, 0]
        report slider in ground via rod basis rod
        """;

    // A rover's body turned by yaw psi, pitch theta and roll phi (z, then y, then x).
    public const string RoverAttitude = """
        title "Rover attitude"
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
        """;

    // A slewing crane with a luffing boom, a trolley and a swinging hook: several levels, params with units.
    public const string Crane = """
        title "Slewing crane with a trolley and a swinging hook"
        param L = 18 m
        param w = 0.6 rpm
        param h = L / 6
        coord psi : angle
        coord s : length
        coord swing : angle
        let yaw = w * t + psi
        frame quay
        frame boom in quay {
            rotate about z by yaw
            rotate about y by -0.2
        }
        frame trolley in boom {
            origin at [s, 0, h]
        }
        frame hook in trolley {
            rotate about y by 0.2
            rotate about x by swing
        }
        point tip in hook at [0, 0, -L/3 - 0.5 m]
        report tip in quay
        report tip in quay via trolley basis boom as tipOnTrolley
        report hook in quay
        """;

    // Observer deep in the tree (the path to the moving frame goes up), and a sensor on a spin frame reported in
    // the spin frame's own basis.
    public const string HookView = """
        param w = 0.6 rpm
        coord psi : angle
        coord swing : angle
        frame quay
        frame boom in quay {
            rotate about z by w * t + psi
        }
        frame trolley in boom {
            origin at [4 m, 0, 2 m]
        }
        frame hook in trolley {
            rotate about x by swing
        }
        frame imu in hook {
            spin [swing', 0, psi']
        }
        point bollard in quay at [10 m, 0, 0]
        point lens in imu at [0, 0, 0.05]
        report bollard in hook via boom basis trolley
        report lens in hook basis imu
        """;

    public static CheckedSpec Check(string text, string path = "test.motion")
    {
        var checkedSpec = SpecCompiler.Check(path, text);
        Assert.False(checkedSpec.HasErrors, string.Join("\n", checkedSpec.Diagnostics.Select(d => $"{d.Code} {d.Message}")));
        return checkedSpec;
    }

    private static readonly System.Collections.Concurrent.ConcurrentDictionary<string, Lazy<KinematicModel>> Models = new(StringComparer.Ordinal);
    private static readonly System.Collections.Concurrent.ConcurrentDictionary<(string, DerivationFormat), Lazy<string>> Derivations = new();

    /// <summary>The checked model of a spec, built once per test run (the model is immutable).</summary>
    public static KinematicModel Model(string text) => Models.GetOrAdd(text, t => new Lazy<KinematicModel>(() => Check(t).Model!)).Value;

    /// <summary>The derivation of a spec under the name "demo", written once per test run and format.</summary>
    public static string Derived(string text, DerivationFormat format) =>
        Derivations.GetOrAdd((text, format), k => new Lazy<string>(() => DerivationWriter.Write(Model(k.Item1), "demo", k.Item2))).Value;
}
