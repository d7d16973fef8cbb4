using MotionSpec.Language.Binding.Symbols;

namespace MotionSpec.Language.Binding;

/// <summary>
/// Where an expression stands: what it is called in messages, whether it defines a param (constants only),
/// whether vectors may appear, and the basis a bare bracket takes there.
/// </summary>
internal sealed record ExpressionPlace(string Description, bool IsParamDefinition, bool AllowsVectors, FrameSymbol? DefaultBasis);
