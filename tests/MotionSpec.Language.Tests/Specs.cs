namespace MotionSpec.Language.Tests;

/// <summary>Realistic specs written for these tests; together they use every construct of the language.</summary>
internal static class Specs
{
    /// <summary>A slewing harbour crane with a trolley on its jib and a hook hanging below.</summary>
    public const string Crane = """
        title "Slewing crane, trolley and hook \"demo\""
        param Lj = 24 m              # jib length
        param slew = 0.8 rpm
        param drop = Lj / 8
        param tilt = 4 deg
        coord theta : angle
        coord r     : length
        coord sway  : angle
        let heading = slew * t + theta
        frame ground
        frame jib in ground {
            rotate about z by heading
            rotate about y by -tilt
        }
        frame carriage in jib {
            origin at [r, 0, drop]
        }
        frame block in carriage {
            rotate about y by tilt
            rotate about x by sway
        }
        point hookTip in block at [0, 0, -Lj/4 - 0.3 m]
        point slider in jib at r * jib.x + [0, 0, drop]
        report hookTip in ground
        report hookTip in ground via carriage
        report slider in ground via jib basis jib as sliderLoad
        report block in ground
        """;

    /// <summary>A rover on a turntable with a gimballed sensor known only by its rates.</summary>
    public const string Rover = """
        param R = 2.5 m
        param spinRate = 12 deg/s
        param g = 1 g0
        coord a : angle
        coord b : angle
        coord c : angle
        coord u : length
        let wobble = 0.01 * sin(2 * a) + cos(b)^2 - -a^-2 * 0
        frame deck
        frame table in deck {
            rotate about [0, 0, 1] by spinRate * t
            origin at [0, 0, 0.4 m] in deck
        }
        frame sensor in table {
            spin [a', b', c']
            origin at [R, 0, 0]
        }
        point lens in sensor at [0, 0, 5 cm]
        point rim in table at R * table.x + u * cross(table.x, table.y) + dot(table.x, table.x) * [0, 0, 1 mm]
        report lens in sensor
        report lens in table basis sensor
        report rim in deck via table
        """;

    /// <summary>A centrifuge arm with every function and unit of the language.</summary>
    public const string Centrifuge = """
        param arm = 0.35 m + 12 cm + 30 mm + 0.001 km + 2 in + 1 ft
        param w0 = 3000 rpm
        param lift = 1.5 rev/s * 2 s + 1 rad + pi
        param late = 1 min + 1 h + 100ms + 2 s
        param fast = 36 km/h + 5 mm/s + 1 m/s
        param acc = 9.81 m/s^2 + 1 m*s^-2
        coord q : angle
        let f1 = sin(q) + cos(q) + tan(q) + asin(0.5) + acos(0.5) + atan(q) + atan2(q, 1) + sqrt(q^2) + exp(q) + ln(2)
        let f2 = q' * t + q'' * t^2 / 2 + (2^-1) * q + -q^2 + q^(1/2)
        frame lab
        frame rotor in lab {
            rotate about z by w0 * t + f1 * 0 + f2 * 0
        }
        frame arm1 in rotor {
            origin at (arm * rotor.x) / 2 - -[0, 0, 0]
        }
        point sample in arm1 at [arm, 0, 0]
        report sample in lab via rotor basis rotor
        report arm1 in lab basis rotor as armMotion
        """;

    public static readonly string[] All = [Crane, Rover, Centrifuge];
}
