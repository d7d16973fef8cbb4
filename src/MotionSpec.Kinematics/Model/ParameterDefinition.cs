using MotionSpec.Language.Binding.Symbols;
using MotionSpec.Symbolic;

using Symbol = MotionSpec.Symbolic.Symbol;

namespace MotionSpec.Kinematics;

/// <summary>A param as a symbol with its definition in SI (in terms of earlier params when derived).</summary>
public sealed record ParameterDefinition(ParamSymbol Param, Symbol Symbol, Expr Definition);
