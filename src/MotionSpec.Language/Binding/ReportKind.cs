namespace MotionSpec.Language.Binding;

/// <summary>Whether a report follows a point or a frame.</summary>
public enum ReportKind
{
    /// <summary>Position, velocity, acceleration and the five terms of a point.</summary>
    Point,

    /// <summary>Angular velocity and acceleration of a frame and the motion of its origin.</summary>
    Frame,
}
