namespace MotionSpec.Kinematics;

/// <summary>The vectors a report gives; their keys are those of <c>eval --format json</c>.</summary>
public enum Quantity
{
    /// <summary>Position of the point relative to the observer's origin.</summary>
    Position,

    /// <summary>Velocity of the point as seen in the observer.</summary>
    Velocity,

    /// <summary>Acceleration of the point as seen in the observer.</summary>
    Acceleration,

    /// <summary>Acceleration of the point as seen in the moving frame.</summary>
    Relative,

    /// <summary>omega x (omega x r).</summary>
    Centripetal,

    /// <summary>alpha x r.</summary>
    Angular,

    /// <summary>2 omega x v_rel.</summary>
    Coriolis,

    /// <summary>Acceleration of the moving frame's origin as seen in the observer.</summary>
    Origin,

    /// <summary>Angular velocity of a frame relative to the observer.</summary>
    AngularVelocity,

    /// <summary>Angular acceleration of a frame relative to the observer.</summary>
    AngularAcceleration,

    /// <summary>Position of a frame's origin relative to the observer's origin.</summary>
    OriginPosition,

    /// <summary>Velocity of a frame's origin as seen in the observer.</summary>
    OriginVelocity,

    /// <summary>Acceleration of a frame's origin as seen in the observer.</summary>
    OriginAcceleration,
}
