using System.Globalization;
using MotionSpec.Sample.Evaluators;

// Evaluators generated at build time from two demo specs (see the AdditionalFiles in the project file).

// A swinging-bucket centrifuge at 4500 rpm with the buckets swung out horizontal: the load at the tube bottom.
var rotor = new SwingBucketCentrifuge.State { spinAngle_dot = 4500 * 2 * Math.PI / 60, swingOut = Math.PI / 2 };
var pellet = SwingBucketCentrifuge.PelletAlongTube(0.0, in rotor, SwingBucketCentrifuge.Parameters.Default);
// Swung out, the bucket's z axis points from the tube bottom back towards the rotor axis.
var towardsAxis = pellet.Acceleration.Z;
Console.WriteLine(string.Create(CultureInfo.InvariantCulture,
    $"centrifuge at 4500 rpm: {towardsAxis:F0} m/s^2 along the tube, RCF {towardsAxis / 9.80665:F0}"));

// The radial scan: the carriage moving outwards at 50 mm/s on the turning table feels a Coriolis load.
var carriage = new RadialScan.State { radius = 0.2, radius_dot = 0.05 };
var head = RadialScan.HeadOnRail(1.0, in carriage, RadialScan.Parameters.Default);
Console.WriteLine(string.Create(CultureInfo.InvariantCulture,
    $"radial scan: Coriolis {head.Coriolis.Y:F4} m/s^2 across the rail, centripetal {head.Centripetal.X:F4} m/s^2 along it"));
return 0;
