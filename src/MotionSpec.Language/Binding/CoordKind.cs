namespace MotionSpec.Language.Binding;

/// <summary>What a generalized coordinate measures.</summary>
public enum CoordKind
{
    /// <summary>An angle, in radians.</summary>
    Angle,

    /// <summary>A length, in metres.</summary>
    Length,
}
