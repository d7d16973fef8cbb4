using MotionSpec.Language.Binding;

namespace MotionSpec.Language.Units;

/// <summary>One unit name, such as <c>rpm</c>, with its exact value in SI and its dimension.</summary>
internal sealed record UnitAtom(string Name, ExactNumber Factor, Dimension Dimension);
