using MotionSpec.Language.Binding.Symbols;

namespace MotionSpec.Kinematics;

/// <summary>How one frame moves relative to its parent.</summary>
public sealed class FrameMotion(FrameSymbol frame, Matrix3Expr? orientation, Vector3Expr angularVelocity, Vector3Expr angularAcceleration, Vector3Expr? origin)
{
    /// <summary>The frame.</summary>
    public FrameSymbol Frame { get; } = frame;

    /// <summary>Orientation relative to the parent (columns: the frame's axes in the parent's basis); null for a root or spin frame.</summary>
    public Matrix3Expr? Orientation { get; } = orientation;

    /// <summary>Angular velocity relative to the parent, in the frame's own basis.</summary>
    public Vector3Expr AngularVelocity { get; } = angularVelocity;

    /// <summary>Angular acceleration relative to the parent, in the frame's own basis.</summary>
    public Vector3Expr AngularAcceleration { get; } = angularAcceleration;

    /// <summary>The origin relative to the parent's origin in the parent's basis; null when omitted or not expressible there.</summary>
    public Vector3Expr? Origin { get; } = origin;
}
