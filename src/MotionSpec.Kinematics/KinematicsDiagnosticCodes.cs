namespace MotionSpec.Kinematics;

/// <summary>The MOT4xxx codes: what the kinematics stage can find wrong with a spec that binds cleanly.</summary>
public static class KinematicsDiagnosticCodes
{
    /// <summary>A report would need the orientation of a spin frame relative to its parent, which is unknown.</summary>
    public const string UnknownOrientation = "MOT4001";

    /// <summary>A report would need a derivative beyond the second of a coord (q''' or higher).</summary>
    public const string DerivativeNotAvailable = "MOT4002";

    /// <summary>A vector names the basis of a frame in another tree, so no rotation relates them.</summary>
    public const string UnrelatedTrees = "MOT4003";

    /// <summary>Every code with a one-line description, for documentation and tests.</summary>
    public static IReadOnlyList<(string Code, string Description)> All { get; } =
    [
        (UnknownOrientation, "a report needs the orientation of a spin frame relative to its parent"),
        (DerivativeNotAvailable, "a report needs a third or higher derivative of a coord"),
        (UnrelatedTrees, "a vector uses the basis of a frame in another tree"),
    ];
}
