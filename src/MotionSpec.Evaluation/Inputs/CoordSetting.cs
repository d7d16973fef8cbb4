namespace MotionSpec.Evaluation.Inputs;

/// <summary>A coord's value, rate and acceleration in SI (rad or m, per second, per second squared).</summary>
public readonly record struct CoordSetting(double Value, double Rate, double Acceleration);
