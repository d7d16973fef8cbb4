namespace MotionSpec.Kinematics;

/// <summary>
/// Angular velocity and acceleration of a frame relative to an observer, composed along the tree and written in
/// the frame's own basis; <see cref="CrossTerm"/> is the omega x omega part of the composed acceleration.
/// </summary>
public sealed record FrameComposition(Vector3Expr AngularVelocity, Vector3Expr AngularAcceleration, Vector3Expr CrossTerm);
