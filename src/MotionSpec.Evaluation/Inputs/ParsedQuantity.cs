using MotionSpec.Language.Binding;

namespace MotionSpec.Evaluation.Inputs;

/// <summary>A value read from the command line in SI, with the dimension of its unit, or null when none was written.</summary>
internal readonly record struct ParsedQuantity(double Value, Dimension? Unit);
