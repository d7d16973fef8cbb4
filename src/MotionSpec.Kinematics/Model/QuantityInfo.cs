using MotionSpec.Language.Binding;

namespace MotionSpec.Kinematics;

/// <summary>Names, dimensions and orders of the report quantities.</summary>
public static class QuantityInfo
{
    /// <summary>A point report's quantities in output order.</summary>
    public static IReadOnlyList<Quantity> PointQuantities { get; } =
        [Quantity.Position, Quantity.Velocity, Quantity.Acceleration, Quantity.Relative, Quantity.Centripetal, Quantity.Angular, Quantity.Coriolis, Quantity.Origin];

    /// <summary>A frame report's quantities in output order.</summary>
    public static IReadOnlyList<Quantity> FrameQuantities { get; } =
        [Quantity.AngularVelocity, Quantity.AngularAcceleration, Quantity.OriginPosition, Quantity.OriginVelocity, Quantity.OriginAcceleration];

    /// <summary>The five terms whose sum is the acceleration.</summary>
    public static IReadOnlyList<Quantity> Terms { get; } =
        [Quantity.Relative, Quantity.Centripetal, Quantity.Angular, Quantity.Coriolis, Quantity.Origin];

    /// <summary>The key used by JSON, CSV and text output: <c>position</c> ... <c>originAcceleration</c>.</summary>
    public static string Key(Quantity quantity) => quantity switch
    {
        Quantity.Position => "position",
        Quantity.Velocity => "velocity",
        Quantity.Acceleration => "acceleration",
        Quantity.Relative => "relative",
        Quantity.Centripetal => "centripetal",
        Quantity.Angular => "angular",
        Quantity.Coriolis => "coriolis",
        Quantity.Origin => "origin",
        Quantity.AngularVelocity => "angularVelocity",
        Quantity.AngularAcceleration => "angularAcceleration",
        Quantity.OriginPosition => "originPosition",
        Quantity.OriginVelocity => "originVelocity",
        Quantity.OriginAcceleration => "originAcceleration",
        _ => throw new ArgumentOutOfRangeException(nameof(quantity)),
    };

    /// <summary>The name an engineer uses for the quantity.</summary>
    public static string TradeName(Quantity quantity) => quantity switch
    {
        Quantity.Position => "position",
        Quantity.Velocity => "velocity",
        Quantity.Acceleration => "acceleration",
        Quantity.Relative => "relative acceleration",
        Quantity.Centripetal => "centripetal acceleration",
        Quantity.Angular => "angular-acceleration term",
        Quantity.Coriolis => "Coriolis acceleration",
        Quantity.Origin => "acceleration of the moving frame's origin",
        Quantity.AngularVelocity => "angular velocity",
        Quantity.AngularAcceleration => "angular acceleration",
        Quantity.OriginPosition => "origin position",
        Quantity.OriginVelocity => "origin velocity",
        Quantity.OriginAcceleration => "origin acceleration",
        _ => throw new ArgumentOutOfRangeException(nameof(quantity)),
    };

    /// <summary>The SI dimension: m, m/s, m/s^2, 1/s or 1/s^2.</summary>
    public static Dimension DimensionOf(Quantity quantity) => quantity switch
    {
        Quantity.Position or Quantity.OriginPosition => Dimension.Of(1, 0),
        Quantity.Velocity or Quantity.OriginVelocity => Dimension.Of(1, -1),
        Quantity.AngularVelocity => Dimension.Of(0, -1),
        Quantity.AngularAcceleration => Dimension.Of(0, -2),
        _ => Dimension.Of(1, -2),
    };
}
