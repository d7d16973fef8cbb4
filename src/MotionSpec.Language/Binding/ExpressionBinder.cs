using System.Globalization;
using MotionSpec.Language.Binding.Expressions;
using MotionSpec.Language.Binding.Symbols;
using MotionSpec.Language.Diagnostics;
using MotionSpec.Language.Syntax;
using MotionSpec.Language.Text;
using MotionSpec.Language.Units;

namespace MotionSpec.Language.Binding;

/// <summary>
/// Binds one expression: resolves names, folds units into exact SI numbers, checks dimensions and
/// vector/scalar use, and tracks constant values so that a non-finite constant (division by a constant zero
/// included) is reported where it first appears.
/// </summary>
internal sealed class ExpressionBinder(Scope scope, DiagnosticBag diagnostics)
{
    private readonly Dictionary<BoundExpr, double> _constants = [];
    private readonly List<(TextSpan Span, string Atom, string Number)> _unitNotes = [];
    private ExpressionPlace _place = new("an expression", false, false, null);

    /// <summary>True when the last bound expression named a param (so a param defined by it is derived).</summary>
    public bool UsedParam { get; private set; }

    /// <summary>The constant value of a bound expression, when it is one (numbers, units, pi, params).</summary>
    public double? ConstantValue(BoundExpr expr) => _constants.TryGetValue(expr, out var value) ? value : null;

    /// <summary>Binds an expression for the given place.</summary>
    public BoundExpr Bind(ExpressionSyntax syntax, ExpressionPlace place)
    {
        _place = place;
        UsedParam = false;
        _unitNotes.Clear();
        return BindExpression(syntax);
    }

    /// <summary>
    /// Checks that a bound expression suits its place: a vector or a scalar, of the required dimension or free.
    /// </summary>
    public void RequirePlace(BoundExpr expr, bool vector, Dimension required, string what)
    {
        if (expr is BoundErrorExpr)
        {
            return;
        }

        if (vector && !expr.IsVector)
        {
            diagnostics.Error(LanguageDiagnosticCodes.VectorExpected, expr.Span, $"{what} takes a vector such as [x, y, z], not a scalar");
            return;
        }

        if (!vector && expr.IsVector)
        {
            diagnostics.Error(LanguageDiagnosticCodes.ScalarExpected, expr.Span, $"{what} takes a scalar, not a vector");
            return;
        }

        if (!expr.Dimension.Accepts(required))
        {
            diagnostics.Error(LanguageDiagnosticCodes.WrongDimension, expr.Span,
                $"{what} must be {Words(required)}, but this is {Words(expr.Dimension)}" + UnitNote(expr.Span));
        }
    }

    /// <summary>Words for a dimension in messages.</summary>
    public static string Words(Dimension dimension) => dimension.IsFree
        ? "free (no unit)"
        : (dimension.Length, dimension.Time) switch
        {
            (0, 0) => "an angle (dimensionless)",
            (1, 0) => "a length",
            (0, 1) => "a time",
            (0, -1) => "a rate (1/s)",
            (1, -1) => "a speed (m/s)",
            (1, -2) => "an acceleration (m/s^2)",
            _ => "of unit " + dimension.SiUnit(),
        };

    private BoundExpr BindExpression(ExpressionSyntax syntax) => syntax switch
    {
        NumberSyntax number => BindNumber(number),
        NameSyntax name => BindName(name),
        TimeSyntax time => BindTime(time),
        PiSyntax pi => Constant(new BoundNumber(pi.Span, Dimension.Free, new ExactNumber(1, 1, 1)), Math.PI),
        ParenthesizedSyntax paren => BindExpression(paren.Inner),
        NegateSyntax negate => BindNegate(negate),
        BinarySyntax binary => BindBinary(binary),
        PowerSyntax power => BindPower(power),
        CallSyntax call => BindCall(call),
        BracketSyntax bracket => BindBracket(bracket),
        UnitVectorSyntax unitVector => BindUnitVector(unitVector),
        _ => new BoundErrorExpr(syntax.Span, false),
    };

    private BoundExpr BindNumber(NumberSyntax number)
    {
        var exact = ExactNumber.ParseDecimal(number.Text.TrimEnd('.'));
        if (exact is not { } value)
        {
            diagnostics.Error(LanguageDiagnosticCodes.NonFiniteConstant, number.Span, $"the number {number.Text} is beyond the range of finite numbers");
            return new BoundErrorExpr(number.Span, false);
        }

        var dimension = Dimension.Free;
        if (number.Unit is { } unit)
        {
            var reading = UnitReader.Read(unit.Text);
            if (reading.UnknownAtom is { } unknown)
            {
                var close = NameSuggestions.Closest(unknown, scope.InOrder.Where(IsValue));
                var product = close is null ? null : number.Text + " * " + close.Name;
                diagnostics.Error(LanguageDiagnosticCodes.UnknownUnit, unit.Span,
                    close is null
                        ? $"unknown unit '{unknown}' (units are {UnitTable.Names})"
                        : $"unknown unit '{unknown}'; did you mean '{product}'? (there is no implicit multiplication)",
                    product);
                return new BoundErrorExpr(number.Span, false);
            }

            if (reading.ExponentTooLarge)
            {
                diagnostics.Error(LanguageDiagnosticCodes.ExponentTooLarge, unit.Span, $"an exponent in the unit '{unit.Text}' is beyond the limit of {Limits.Exponent}");
                return new BoundErrorExpr(number.Span, false);
            }

            foreach (var atom in reading.Atoms)
            {
                if (string.Equals(atom, "in", StringComparison.Ordinal) || scope.Find(atom) is not null)
                {
                    _unitNotes.Add((number.Span, atom, number.Text));
                }
            }

            value = ExactNumber.Multiply(value, reading.Factor);
            dimension = reading.Dimension;
        }

        return CheckedConstant(new BoundNumber(number.Span, dimension, value), value.ToDouble(), number.Span);
    }

    private BoundExpr BindName(NameSyntax name)
    {
        var symbol = scope.Find(name.Name);
        if (symbol is null)
        {
            if (scope.IsBroken(name.Name))
            {
                return new BoundErrorExpr(name.Span, false);
            }

            if (scope.IsFrameUnderConstruction(name.Name))
            {
                diagnostics.Error(LanguageDiagnosticCodes.FrameInOwnBlock, name.Span, $"frame '{name.Name}' is not in scope inside its own block");
            }
            else
            {
                var close = NameSuggestions.Closest(name.Name, scope.InOrder.Where(s => _place.IsParamDefinition ? s is ParamSymbol : IsValue(s)));
                diagnostics.Error(LanguageDiagnosticCodes.UnknownName, name.Span,
                    close is null ? $"unknown name '{name.Name}'" : $"unknown name '{name.Name}'; did you mean '{close.Name}'?",
                    close?.Name);
            }

            return new BoundErrorExpr(name.Span, false);
        }

        if (name.Marks > 0 && symbol is not CoordSymbol)
        {
            diagnostics.Error(LanguageDiagnosticCodes.MarkOnNonCoord, name.Span,
                $"'{symbol.Name}' is a {symbol.KindName}; marks (' and '') go only on coords");
            return new BoundErrorExpr(name.Span, false);
        }

        switch (symbol)
        {
            case ParamSymbol param:
                UsedParam = true;
                var reference = new BoundParamReference(name.Span, param);
                if (param.Definition is BoundErrorExpr || !IsFinite(param.Value))
                {
                    return new BoundErrorExpr(name.Span, false);
                }

                return Constant(reference, param.Value);
            case CoordSymbol coord when _place.IsParamDefinition:
                diagnostics.Error(LanguageDiagnosticCodes.ParamNotConstant, name.Span,
                    $"a param is a constant, so it cannot use the coord '{coord.Name}' (use let for expressions of coords)");
                return new BoundErrorExpr(name.Span, false);
            case CoordSymbol coord:
                return new BoundCoordReference(name.Span, coord, name.Marks);
            case LetSymbol let when _place.IsParamDefinition:
                diagnostics.Error(LanguageDiagnosticCodes.ParamNotConstant, name.Span,
                    $"a param is a constant, so it cannot use the let '{let.Name}'");
                return new BoundErrorExpr(name.Span, false);
            case LetSymbol let:
                return let.Definition is BoundErrorExpr ? new BoundErrorExpr(name.Span, false) : new BoundLetReference(name.Span, let);
            case FrameSymbol frame:
                diagnostics.Error(LanguageDiagnosticCodes.WrongKind, name.Span,
                    $"'{frame.Name}' is a frame, not a value; its unit vectors are {frame.Name}.x, {frame.Name}.y and {frame.Name}.z");
                return new BoundErrorExpr(name.Span, false);
            default:
                diagnostics.Error(LanguageDiagnosticCodes.WrongKind, name.Span, $"'{symbol.Name}' is a {symbol.KindName}, not a value");
                return new BoundErrorExpr(name.Span, false);
        }
    }

    private BoundExpr BindTime(TimeSyntax time)
    {
        if (time.Marks > 0)
        {
            diagnostics.Error(LanguageDiagnosticCodes.MarkOnNonCoord, time.Span, "'t' is time; marks (' and '') go only on coords");
            return new BoundErrorExpr(time.Span, false);
        }

        if (_place.IsParamDefinition)
        {
            diagnostics.Error(LanguageDiagnosticCodes.ParamNotConstant, time.Span, "a param is a constant, so it cannot use the time 't' (use let)");
            return new BoundErrorExpr(time.Span, false);
        }

        return new BoundTime(time.Span);
    }

    private BoundExpr BindNegate(NegateSyntax negate)
    {
        var operand = BindExpression(negate.Operand);
        if (operand is BoundErrorExpr)
        {
            return new BoundErrorExpr(negate.Span, operand.IsVector);
        }

        var result = new BoundUnary(negate.Span, BoundUnaryOperator.Negate, operand);
        return ConstantValue(operand) is { } value ? Constant(result, -value) : result;
    }

    private BoundExpr BindBinary(BinarySyntax binary)
    {
        var left = BindExpression(binary.Left);
        var right = BindExpression(binary.Right);
        if (left is BoundErrorExpr || right is BoundErrorExpr)
        {
            return new BoundErrorExpr(binary.Span, left.IsVector || right.IsVector);
        }

        Dimension dimension;
        BoundBinaryOperator op;
        switch (binary.Operator)
        {
            case '+':
            case '-':
                op = binary.Operator == '+' ? BoundBinaryOperator.Add : BoundBinaryOperator.Subtract;
                var verb = binary.Operator == '+' ? "add" : "subtract";
                if (left.IsVector != right.IsVector)
                {
                    diagnostics.Error(LanguageDiagnosticCodes.InvalidVectorArithmetic, binary.OperatorSpan,
                        $"cannot {verb} a vector and a scalar");
                    return new BoundErrorExpr(binary.Span, true);
                }

                if (!left.Dimension.IsFree && !right.Dimension.IsFree && left.Dimension != right.Dimension)
                {
                    diagnostics.Error(LanguageDiagnosticCodes.DimensionMismatch, binary.Span,
                        $"cannot {verb} {Words(right.Dimension)} {(binary.Operator == '+' ? "to" : "from")} {Words(left.Dimension)}" + UnitNote(binary.Span));
                    return new BoundErrorExpr(binary.Span, left.IsVector);
                }

                dimension = left.Dimension.IsFree ? right.Dimension : left.Dimension;
                break;
            case '*':
                op = BoundBinaryOperator.Multiply;
                if (left.IsVector && right.IsVector)
                {
                    diagnostics.Error(LanguageDiagnosticCodes.InvalidVectorArithmetic, binary.OperatorSpan,
                        "two vectors cannot be multiplied with '*': use dot(u, v) or cross(u, v)");
                    return new BoundErrorExpr(binary.Span, true);
                }

                dimension = DimensionRules.Multiply(left.Dimension, right.Dimension);
                break;
            default:
                op = BoundBinaryOperator.Divide;
                if (right.IsVector)
                {
                    diagnostics.Error(LanguageDiagnosticCodes.InvalidVectorArithmetic, binary.OperatorSpan, "cannot divide by a vector");
                    return new BoundErrorExpr(binary.Span, left.IsVector);
                }

                if (ConstantValue(right) is 0.0)
                {
                    diagnostics.Error(LanguageDiagnosticCodes.DivisionByZero, binary.Right.Span,
                        $"division by '{binary.Right}', which is a constant zero");
                    return new BoundErrorExpr(binary.Span, left.IsVector);
                }

                dimension = DimensionRules.Divide(left.Dimension, right.Dimension);
                break;
        }

        var result = new BoundBinary(binary.Span, dimension, op, left, right);
        if (ConstantValue(left) is { } l && ConstantValue(right) is { } r)
        {
            var value = op switch
            {
                BoundBinaryOperator.Add => l + r,
                BoundBinaryOperator.Subtract => l - r,
                BoundBinaryOperator.Multiply => l * r,
                _ => l / r,
            };
            return CheckedConstant(result, value, binary.Span);
        }

        return result;
    }

    private BoundExpr BindPower(PowerSyntax power)
    {
        var @base = BindExpression(power.Base);
        var exponent = ExponentEvaluator.Evaluate(power.Exponent, diagnostics);
        if (@base is BoundErrorExpr || exponent is not { } n)
        {
            return new BoundErrorExpr(power.Span, false);
        }

        if (@base.IsVector)
        {
            diagnostics.Error(LanguageDiagnosticCodes.ScalarExpected, power.Base.Span, "a vector cannot be raised to a power");
            return new BoundErrorExpr(power.Span, false);
        }

        Dimension dimension;
        if (@base.Dimension.IsFree)
        {
            dimension = Dimension.Free;
        }
        else if (!n.Denominator.IsOne)
        {
            if (@base.Dimension != Dimension.Dimensionless)
            {
                diagnostics.Error(LanguageDiagnosticCodes.FractionalPowerOfDimension, power.Span,
                    $"the power {n} is not a whole number, so its base must be an angle (dimensionless) or free, but it is {Words(@base.Dimension)}" + UnitNote(power.Span));
                return new BoundErrorExpr(power.Span, false);
            }

            dimension = Dimension.Dimensionless;
        }
        else if (DimensionRules.Power(@base.Dimension, (long)n.Numerator) is { } raised)
        {
            dimension = raised;
        }
        else
        {
            diagnostics.Error(LanguageDiagnosticCodes.ExponentTooLarge, power.Span, "the dimension of this power grows beyond the limit");
            return new BoundErrorExpr(power.Span, false);
        }

        var result = new BoundPower(power.Span, dimension, @base, n.Numerator, n.Denominator);
        if (ConstantValue(@base) is { } b)
        {
            if (b == 0 && n.Numerator.Sign < 0)
            {
                diagnostics.Error(LanguageDiagnosticCodes.DivisionByZero, power.Span, "a negative power of a constant zero divides by zero");
                return new BoundErrorExpr(power.Span, false);
            }

            return CheckedConstant(result, Math.Pow(b, (double)n.Numerator / (double)n.Denominator), power.Span);
        }

        return result;
    }

    private BoundExpr BindCall(CallSyntax call)
    {
        var name = call.Function.Text;
        var expected = name is "atan2" or "cross" or "dot" ? 2 : 1;
        if (call.Arguments.Count != expected)
        {
            diagnostics.Error(LanguageDiagnosticCodes.ArgumentCount, call.Span,
                $"{name} takes {(expected == 1 ? "one argument" : "two arguments")}, not {call.Arguments.Count.ToString(CultureInfo.InvariantCulture)}");
            return new BoundErrorExpr(call.Span, name == "cross");
        }

        var arguments = call.Arguments.Select(BindExpression).ToList();
        if (arguments.Exists(a => a is BoundErrorExpr))
        {
            return new BoundErrorExpr(call.Span, name == "cross");
        }

        if (name is "cross" or "dot")
        {
            var scalar = arguments.FirstOrDefault(a => !a.IsVector);
            if (scalar is not null)
            {
                diagnostics.Error(LanguageDiagnosticCodes.VectorExpected, scalar.Span, $"{name} takes two vectors; this is a scalar");
                return new BoundErrorExpr(call.Span, name == "cross");
            }

            var dimension = DimensionRules.Multiply(arguments[0].Dimension, arguments[1].Dimension);
            return name == "cross"
                ? new BoundCross(call.Span, dimension, arguments[0], arguments[1])
                : new BoundDot(call.Span, dimension, arguments[0], arguments[1]);
        }

        var vector = arguments.FirstOrDefault(a => a.IsVector);
        if (vector is not null)
        {
            diagnostics.Error(LanguageDiagnosticCodes.ScalarExpected, vector.Span, $"{name} takes a scalar, not a vector");
            return new BoundErrorExpr(call.Span, false);
        }

        var function = FunctionOf(name);
        Dimension result;
        switch (function)
        {
            case BoundFunction.Sqrt:
                var d = arguments[0].Dimension;
                if (d.IsFree)
                {
                    result = Dimension.Free;
                }
                else if (d.Length % 2 != 0 || d.Time % 2 != 0)
                {
                    diagnostics.Error(LanguageDiagnosticCodes.SqrtOddDimension, call.Span,
                        $"sqrt of {Words(d)} has no dimension: the exponents of length and time must be even" + UnitNote(call.Span));
                    return new BoundErrorExpr(call.Span, false);
                }
                else
                {
                    result = Dimension.Of(d.Length / 2, d.Time / 2);
                }

                break;
            case BoundFunction.Atan2:
                var y = arguments[0].Dimension;
                var x = arguments[1].Dimension;
                if (!y.IsFree && !x.IsFree && y != x)
                {
                    diagnostics.Error(LanguageDiagnosticCodes.Atan2Dimensions, call.Span,
                        $"atan2 needs two arguments of one dimension, but they are {Words(y)} and {Words(x)}" + UnitNote(call.Span));
                    return new BoundErrorExpr(call.Span, false);
                }

                result = Dimension.Dimensionless;
                break;
            default:
                if (!arguments[0].Dimension.Accepts(Dimension.Dimensionless))
                {
                    diagnostics.Error(LanguageDiagnosticCodes.FunctionArgumentDimension, call.Arguments[0].Span,
                        $"the argument of {name} must be an angle (dimensionless) or free, but it is {Words(arguments[0].Dimension)}" + UnitNote(call.Span));
                    return new BoundErrorExpr(call.Span, false);
                }

                result = Dimension.Dimensionless;
                break;
        }

        var bound = new BoundCall(call.Span, result, function, arguments);
        if (arguments.TrueForAll(a => ConstantValue(a) is not null))
        {
            var a0 = ConstantValue(arguments[0])!.Value;
            var value = function switch
            {
                BoundFunction.Sin => Math.Sin(a0),
                BoundFunction.Cos => Math.Cos(a0),
                BoundFunction.Tan => Math.Tan(a0),
                BoundFunction.Asin => Math.Asin(a0),
                BoundFunction.Acos => Math.Acos(a0),
                BoundFunction.Atan => Math.Atan(a0),
                BoundFunction.Atan2 => Math.Atan2(a0, ConstantValue(arguments[1])!.Value),
                BoundFunction.Sqrt => Math.Sqrt(a0),
                BoundFunction.Exp => Math.Exp(a0),
                _ => Math.Log(a0),
            };
            return CheckedConstant(bound, value, call.Span);
        }

        return bound;
    }

    private BoundExpr BindBracket(BracketSyntax bracket)
    {
        if (!VectorsAllowedHere(bracket))
        {
            return new BoundErrorExpr(bracket.Span, true);
        }

        var components = bracket.Components.Select(BindExpression).ToList();
        FrameSymbol? basis = bracket.Basis is { } written ? ResolveFrame(written) : _place.DefaultBasis;
        if (components.Exists(c => c is BoundErrorExpr) || basis is null)
        {
            return new BoundErrorExpr(bracket.Span, true);
        }

        var vector = components.FirstOrDefault(c => c.IsVector);
        if (vector is not null)
        {
            diagnostics.Error(LanguageDiagnosticCodes.ScalarExpected, vector.Span, "a component of a bracket is a scalar, not a vector");
            return new BoundErrorExpr(bracket.Span, true);
        }

        var dimension = Dimension.Free;
        foreach (var component in components)
        {
            if (component.Dimension.IsFree)
            {
                continue;
            }

            if (!dimension.IsFree && dimension != component.Dimension)
            {
                diagnostics.Error(LanguageDiagnosticCodes.BracketDimensions, bracket.Span,
                    $"the components of this bracket have different dimensions: {Words(dimension)} and {Words(component.Dimension)}" + UnitNote(bracket.Span));
                return new BoundErrorExpr(bracket.Span, true);
            }

            dimension = component.Dimension;
        }

        return new BoundBracket(bracket.Span, dimension, basis, components[0], components[1], components[2]) { BasisWritten = bracket.Basis is not null };
    }

    private BoundExpr BindUnitVector(UnitVectorSyntax unitVector)
    {
        if (!VectorsAllowedHere(unitVector))
        {
            return new BoundErrorExpr(unitVector.Span, true);
        }

        var frame = ResolveFrame(unitVector.Frame);
        if (frame is null)
        {
            return new BoundErrorExpr(unitVector.Span, true);
        }

        var axis = unitVector.Axis.Text switch
        {
            "x" => Axis.X,
            "y" => Axis.Y,
            _ => Axis.Z,
        };
        return new BoundUnitVector(unitVector.Span, frame, axis);
    }

    private bool VectorsAllowedHere(ExpressionSyntax syntax)
    {
        if (_place.AllowsVectors)
        {
            return true;
        }

        diagnostics.Error(LanguageDiagnosticCodes.ScalarExpected, syntax.Span,
            $"{_place.Description} is a scalar; vectors appear only in origin at, point ... at, spin and rotation axes");
        return false;
    }

    /// <summary>The frame a name refers to, or null after reporting why it is none.</summary>
    public FrameSymbol? ResolveFrame(IdentifierSyntax name)
    {
        var symbol = scope.Find(name.Text);
        switch (symbol)
        {
            case FrameSymbol frame:
                return frame;
            case null when scope.IsBroken(name.Text):
                return null;
            case null when scope.IsFrameUnderConstruction(name.Text):
                diagnostics.Error(LanguageDiagnosticCodes.FrameInOwnBlock, name.Span, $"frame '{name.Text}' is not in scope inside its own block");
                return null;
            case null:
                var close = NameSuggestions.Closest(name.Text, scope.InOrder.Where(s => s is FrameSymbol));
                diagnostics.Error(LanguageDiagnosticCodes.UnknownFrame, name.Span,
                    close is null ? $"unknown frame '{name.Text}'" : $"unknown frame '{name.Text}'; did you mean '{close.Name}'?",
                    close?.Name);
                return null;
            default:
                diagnostics.Error(LanguageDiagnosticCodes.WrongKind, name.Span, $"'{name.Text}' is a {symbol.KindName}, not a frame");
                return null;
        }
    }

    private BoundExpr Constant(BoundExpr expr, double value)
    {
        _constants[expr] = value;
        return expr;
    }

    private BoundExpr CheckedConstant(BoundExpr expr, double value, TextSpan span)
    {
        if (!IsFinite(value))
        {
            diagnostics.Error(LanguageDiagnosticCodes.NonFiniteConstant, span,
                double.IsNaN(value)
                    ? "this constant has no value (it is not a number, as in sqrt(-1) or asin(2))"
                    : "this constant is beyond the range of finite numbers");
            return new BoundErrorExpr(span, expr.IsVector);
        }

        return Constant(expr, value);
    }

    private string UnitNote(TextSpan span)
    {
        foreach (var (at, atom, number) in _unitNotes)
        {
            if (at.Start >= span.Start && at.End <= span.End)
            {
                if (string.Equals(atom, "in", StringComparison.Ordinal))
                {
                    return $"; note: after a number, 'in' is the unit inch ('{number} in' is {number} inches)";
                }

                var declared = scope.Find(atom);
                return $"; note: after a number, '{atom}' is the unit {UnitWord(atom)}, not the {declared?.KindName ?? "name"} '{atom}': write '{number} * {atom}' for the product";
            }
        }

        return string.Empty;
    }

    private static string UnitWord(string atom) => atom switch
    {
        "h" => "hour",
        "s" => "second",
        "m" => "metre",
        "min" => "minute",
        "ms" => "millisecond",
        _ => atom,
    };

    private static bool IsValue(Symbol symbol) => symbol is ParamSymbol or CoordSymbol or LetSymbol;

    private static bool IsFinite(double value) => !double.IsNaN(value) && !double.IsInfinity(value);

    private static BoundFunction FunctionOf(string name) => name switch
    {
        "sin" => BoundFunction.Sin,
        "cos" => BoundFunction.Cos,
        "tan" => BoundFunction.Tan,
        "asin" => BoundFunction.Asin,
        "acos" => BoundFunction.Acos,
        "atan" => BoundFunction.Atan,
        "atan2" => BoundFunction.Atan2,
        "sqrt" => BoundFunction.Sqrt,
        "exp" => BoundFunction.Exp,
        _ => BoundFunction.Ln,
    };
}
