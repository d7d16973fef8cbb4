using System.Globalization;
using MotionSpec.Language.Binding.Expressions;
using MotionSpec.Language.Binding.Symbols;
using MotionSpec.Language.Diagnostics;
using MotionSpec.Language.Syntax;
using MotionSpec.Language.Text;

namespace MotionSpec.Language.Binding;

/// <summary>
/// Turns the parsed statements into the bound model in one pass in file order: names resolve only to earlier
/// declarations, frames form their trees, every expression is checked for its place, and reports get their
/// defaults and names.
/// </summary>
internal sealed class Binder
{
    private readonly SourceText _source;
    private readonly DiagnosticBag _diagnostics;
    private readonly Scope _scope = new();
    private readonly ExpressionBinder _expressions;
    private readonly List<ParamSymbol> _params = [];
    private readonly List<CoordSymbol> _coords = [];
    private readonly List<LetSymbol> _lets = [];
    private readonly List<FrameSymbol> _frames = [];
    private readonly List<PointSymbol> _points = [];
    private readonly List<ReportSymbol> _reports = [];
    private readonly Dictionary<string, ReportSymbol> _reportMethodNames = new(StringComparer.Ordinal);
    private string? _title;
    private bool _titleSeen;
    private int _frameCount;
    private int _pointCount;
    private int _reportCount;

    private Binder(SourceText source, DiagnosticBag diagnostics)
    {
        _source = source;
        _diagnostics = diagnostics;
        _expressions = new ExpressionBinder(_scope, diagnostics);
    }

    /// <summary>Binds a parsed spec; diagnostics go to the bag.</summary>
    public static BoundSpec Bind(SourceText source, SpecSyntax syntax, DiagnosticBag diagnostics)
    {
        var binder = new Binder(source, diagnostics);
        foreach (var broken in syntax.BrokenDeclarations)
        {
            binder._scope.AddBroken(broken.Text);
        }

        foreach (var statement in syntax.Statements)
        {
            binder.BindStatement(statement);
        }

        return new BoundSpec(source, binder._title, binder._params, binder._coords, binder._lets, binder._frames, binder._points, binder._reports);
    }

    private void BindStatement(StatementSyntax statement)
    {
        switch (statement)
        {
            case TitleSyntax title:
                if (_titleSeen)
                {
                    _diagnostics.Error(LanguageDiagnosticCodes.DuplicateTitle, title.Span, "a spec has at most one title");
                }
                else
                {
                    _titleSeen = true;
                    _title = title.Text;
                }

                break;
            case ParamSyntax param:
                BindParam(param);
                break;
            case CoordSyntax coord:
                if (IsFree(coord.Name))
                {
                    var symbol = new CoordSymbol(coord.Name.Text, coord.Name.Span, coord.Span, _coords.Count, coord.Kind);
                    _coords.Add(symbol);
                    _scope.Add(symbol);
                }

                break;
            case LetSyntax let:
                BindLet(let);
                break;
            case FrameSyntax frame:
                BindFrame(frame);
                break;
            case PointSyntax point:
                BindPoint(point);
                break;
            case ReportSyntax report:
                BindReport(report);
                break;
        }
    }

    private void BindParam(ParamSyntax param)
    {
        var definition = _expressions.Bind(param.Definition, new ExpressionPlace($"param '{param.Name.Text}'", true, false, null));
        var derived = _expressions.UsedParam;
        var value = _expressions.ConstantValue(definition) ?? double.NaN;
        if (IsFree(param.Name))
        {
            var symbol = new ParamSymbol(param.Name.Text, param.Name.Span, param.Span, _params.Count, definition, value, derived);
            _params.Add(symbol);
            _scope.Add(symbol);
        }
    }

    private void BindLet(LetSyntax let)
    {
        var definition = _expressions.Bind(let.Definition, new ExpressionPlace($"let '{let.Name.Text}'", false, false, null));
        if (IsFree(let.Name))
        {
            var symbol = new LetSymbol(let.Name.Text, let.Name.Span, let.Span, definition);
            _lets.Add(symbol);
            _scope.Add(symbol);
        }
    }

    private void BindFrame(FrameSyntax syntax)
    {
        var parent = syntax.Parent is { } parentName ? _expressions.ResolveFrame(parentName) : null;
        var free = IsFree(syntax.Name);
        if (syntax.Parent is not null && parent is null)
        {
            // Its parent is already reported; taken as a root it would only cause derived errors later.
            _scope.AddBroken(syntax.Name.Text);
            free = false;
        }

        _frameCount++;
        if (_frameCount == Limits.Frames + 1)
        {
            _diagnostics.Error(LanguageDiagnosticCodes.TooManyFrames, syntax.Name.Span,
                $"this is frame number {_frameCount.ToString(CultureInfo.InvariantCulture)}; a spec has at most {Limits.Frames.ToString(CultureInfo.InvariantCulture)} frames");
        }

        if (parent is not null && parent.Depth + 1 > Limits.FrameTreeDepth)
        {
            _diagnostics.Error(LanguageDiagnosticCodes.TreeTooDeep, syntax.Name.Span,
                $"frame '{syntax.Name.Text}' would be {(parent.Depth + 1).ToString(CultureInfo.InvariantCulture)} levels below its root; the tree depth limit is {Limits.FrameTreeDepth.ToString(CultureInfo.InvariantCulture)}");

            // Like a frame with an unknown parent: taken as a new root it would start a second tree, and every
            // report and frame further down would then get a derived error of its own (one per 500 links of a
            // long chain, and "not in the same tree" for its reports). The one error above is the whole story.
            if (free)
            {
                _scope.AddBroken(syntax.Name.Text);
            }

            free = false;
        }

        var frame = new FrameSymbol(syntax.Name.Text, syntax.Name.Span, syntax.Span, _frames.Count, parent);
        _scope.FrameUnderConstruction = frame;
        var originSeen = false;
        var spinSeen = false;
        var rotateSeen = false;
        foreach (var item in syntax.Block ?? [])
        {
            switch (item)
            {
                case RotateSyntax rotate:
                    if (spinSeen)
                    {
                        _diagnostics.Error(LanguageDiagnosticCodes.RotateAndSpin, rotate.Span,
                            $"frame '{frame.Name}' already has a spin, so it cannot also rotate: use either rotate statements or one spin");
                    }

                    rotateSeen = true;
                    BindRotation(frame, rotate);
                    break;
                case OriginSyntax origin:
                    if (originSeen)
                    {
                        _diagnostics.Error(LanguageDiagnosticCodes.DuplicateOrigin, origin.Span, $"frame '{frame.Name}' already has an origin");
                    }

                    var position = _expressions.Bind(origin.Position, new ExpressionPlace("origin at", false, true, parent ?? frame));
                    _expressions.RequirePlace(position, true, Dimension.LengthDimension, "origin at");
                    if (!originSeen)
                    {
                        frame.SetOrigin(position, origin.Span);
                    }

                    originSeen = true;
                    break;
                case SpinSyntax spin:
                    if (rotateSeen)
                    {
                        _diagnostics.Error(LanguageDiagnosticCodes.RotateAndSpin, spin.Span,
                            $"frame '{frame.Name}' already has rotate statements, so it cannot also spin: use either rotate statements or one spin");
                    }
                    else if (spinSeen)
                    {
                        _diagnostics.Error(LanguageDiagnosticCodes.DuplicateSpin, spin.Span, $"frame '{frame.Name}' already has a spin");
                    }

                    BindSpin(frame, spin, record: !spinSeen && !rotateSeen);
                    spinSeen = true;
                    break;
            }
        }

        _scope.FrameUnderConstruction = null;
        if (free)
        {
            _scope.Add(frame);
            _frames.Add(frame);
            parent?.AddChild(frame);
        }
    }

    private void BindRotation(FrameSymbol frame, RotateSyntax rotate)
    {
        Axis? axis = null;
        List<ExactNumber>? direction = null;
        switch (rotate.Axis)
        {
            case IdentifierSyntax { Text: "x" }:
                axis = Axis.X;
                break;
            case IdentifierSyntax { Text: "y" }:
                axis = Axis.Y;
                break;
            case IdentifierSyntax { Text: "z" }:
                axis = Axis.Z;
                break;
            case BracketSyntax bracket:
                direction = AxisDirection(bracket);
                break;
            default:
                _diagnostics.Error(LanguageDiagnosticCodes.AxisNotNumbers, rotate.Axis.Span,
                    $"a rotation axis is x, y, z or a bracket of numbers such as [1, 1, 0], not '{rotate.Axis}'");
                break;
        }

        var angle = _expressions.Bind(rotate.Angle, new ExpressionPlace("the angle after 'by'", false, false, null));
        _expressions.RequirePlace(angle, false, Dimension.Dimensionless, "the angle after 'by'");
        if (axis is not null || direction is not null)
        {
            frame.AddRotation(new BoundRotation(rotate.Span, axis, direction, angle));
        }
    }

    private List<ExactNumber>? AxisDirection(BracketSyntax bracket)
    {
        if (bracket.Basis is { } basis)
        {
            _diagnostics.Error(LanguageDiagnosticCodes.AxisNotNumbers, basis.Span,
                "a rotation axis is taken in the frame's own basis as rotated so far, so it has no 'in'");
            return null;
        }

        var direction = new List<ExactNumber>();
        foreach (var component in bracket.Components)
        {
            var negative = component is NegateSyntax;
            if ((negative ? ((NegateSyntax)component).Operand : component) is not NumberSyntax number)
            {
                _diagnostics.Error(LanguageDiagnosticCodes.AxisNotNumbers, component.Span,
                    $"a rotation axis is a bracket of numbers; '{component}' is not a number");
                return null;
            }

            var bound = _expressions.Bind(number, new ExpressionPlace("a rotation axis", false, false, null));
            if (bound is not BoundNumber value)
            {
                return null;
            }

            if (!value.Dimension.Accepts(Dimension.Dimensionless))
            {
                _diagnostics.Error(LanguageDiagnosticCodes.WrongDimension, number.Span,
                    $"a rotation axis must be dimensionless, but this is {ExpressionBinder.Words(value.Dimension)}");
                return null;
            }

            direction.Add(negative ? value.Value.Negate() : value.Value);
        }

        if (direction.TrueForAll(d => d.IsZero))
        {
            _diagnostics.Error(LanguageDiagnosticCodes.ZeroAxis, bracket.Span, "a rotation axis cannot be zero: it has no direction");
            return null;
        }

        return direction;
    }

    private void BindSpin(FrameSymbol frame, SpinSyntax spin, bool record)
    {
        if (spin.Rates is not BracketSyntax { Basis: null })
        {
            _diagnostics.Error(LanguageDiagnosticCodes.SpinNotBracket, spin.Rates.Span,
                "spin takes a bare bracket of rates in the frame's own basis, such as [a', b', c'] (no 'in', no unit vectors)");
            return;
        }

        var rates = _expressions.Bind(spin.Rates, new ExpressionPlace("spin", false, true, frame));
        _expressions.RequirePlace(rates, true, Dimension.Rate, "spin");
        if (record)
        {
            frame.SetSpin(rates, spin.Span);
        }
    }

    private void BindPoint(PointSyntax syntax)
    {
        var frame = _expressions.ResolveFrame(syntax.Frame);
        _pointCount++;
        if (_pointCount == Limits.Points + 1)
        {
            _diagnostics.Error(LanguageDiagnosticCodes.TooManyPoints, syntax.Name.Span,
                $"this is point number {_pointCount.ToString(CultureInfo.InvariantCulture)}; a spec has at most {Limits.Points.ToString(CultureInfo.InvariantCulture)} points");
        }

        BoundExpr position = new BoundErrorExpr(syntax.Position.Span, true);
        if (frame is not null)
        {
            position = _expressions.Bind(syntax.Position, new ExpressionPlace("point ... at", false, true, frame));
            _expressions.RequirePlace(position, true, Dimension.LengthDimension, "point ... at");
        }

        if (frame is null)
        {
            _scope.AddBroken(syntax.Name.Text);
        }
        else if (IsFree(syntax.Name))
        {
            var symbol = new PointSymbol(syntax.Name.Text, syntax.Name.Span, syntax.Span, _points.Count, frame, position);
            _points.Add(symbol);
            _scope.Add(symbol);
        }
    }

    private void BindReport(ReportSyntax syntax)
    {
        _reportCount++;
        if (_reportCount == Limits.Reports + 1)
        {
            _diagnostics.Error(LanguageDiagnosticCodes.TooManyReports, syntax.Subject.Span,
                $"this is report number {_reportCount.ToString(CultureInfo.InvariantCulture)}; a spec has at most {Limits.Reports.ToString(CultureInfo.InvariantCulture)} reports");
        }

        PointSymbol? point = null;
        FrameSymbol? subjectFrame = null;
        switch (_scope.Find(syntax.Subject.Text))
        {
            case PointSymbol p:
                point = p;
                subjectFrame = p.Frame;
                break;
            case FrameSymbol f:
                subjectFrame = f;
                break;
            case null when _scope.IsBroken(syntax.Subject.Text):
                break;
            case null:
                var close = NameSuggestions.Closest(syntax.Subject.Text, _scope.InOrder.Where(s => s is PointSymbol or FrameSymbol));
                _diagnostics.Error(LanguageDiagnosticCodes.UnknownSubject, syntax.Subject.Span,
                    close is null
                        ? $"unknown point or frame '{syntax.Subject.Text}'"
                        : $"unknown point or frame '{syntax.Subject.Text}'; did you mean '{close.Name}'?",
                    close?.Name);
                break;
            case { } other:
                _diagnostics.Error(LanguageDiagnosticCodes.WrongKind, syntax.Subject.Span,
                    $"'{other.Name}' is a {other.KindName}; a report follows a point or a frame");
                break;
        }

        var observer = _expressions.ResolveFrame(syntax.Observer);
        var via = syntax.Via is { } viaName ? _expressions.ResolveFrame(viaName) : null;
        var basis = syntax.Basis is { } basisName ? _expressions.ResolveFrame(basisName) : null;
        if (point is null && subjectFrame is not null && syntax.Via is { } writtenVia)
        {
            _diagnostics.Error(LanguageDiagnosticCodes.ViaOnFrameReport, writtenVia.Span,
                $"'{subjectFrame.Name}' is a frame: via chooses the moving frame of a point's five terms, so a frame report has none");
        }

        if (subjectFrame is not null)
        {
            CheckOneTree(syntax, subjectFrame, (syntax.Observer, observer), (syntax.Via, via), (syntax.Basis, basis));
        }

        var name = syntax.Alias?.Text ?? DefaultName(syntax);
        var nameSpan = syntax.Alias?.Span ?? syntax.Subject.Span;
        var nameFree = IsFree(new IdentifierSyntax(nameSpan, name));
        var methodName = Capitalized(name);
        if (nameFree && _reportMethodNames.TryGetValue(methodName, out var clash))
        {
            _diagnostics.Error(LanguageDiagnosticCodes.ReportNameClash, nameSpan,
                $"report '{name}' and report '{clash.Name}' (line {Line(clash.NameSpan)}) differ only in the case of their first letter, so both would be the method '{methodName}'; name one with 'as'");
            nameFree = false;
        }

        if (subjectFrame is null || observer is null || (syntax.Via is not null && via is null) || (syntax.Basis is not null && basis is null))
        {
            return;
        }

        var kind = point is null ? ReportKind.Frame : ReportKind.Point;
        var report = new ReportSymbol(
            name, nameSpan, syntax.Span, _reports.Count, kind, point, subjectFrame, observer,
            kind == ReportKind.Point ? via ?? subjectFrame : null,
            basis ?? observer);
        if (nameFree)
        {
            _reports.Add(report);
            _scope.Add(report);
            _reportMethodNames.Add(methodName, report);
        }
    }

    private void CheckOneTree(ReportSyntax syntax, FrameSymbol subjectFrame, params (IdentifierSyntax? Name, FrameSymbol? Frame)[] others)
    {
        foreach (var (name, frame) in others)
        {
            if (name is not null && frame is not null && !ReferenceEquals(frame.Root, subjectFrame.Root))
            {
                _diagnostics.Error(LanguageDiagnosticCodes.ReportAcrossTrees, name.Span,
                    $"frame '{frame.Name}' is in the tree of '{frame.Root.Name}', but '{syntax.Subject.Text}' is in the tree of '{subjectFrame.Root.Name}'; the frames of a report must share one tree");
                return;
            }
        }
    }

    private static string DefaultName(ReportSyntax syntax) =>
        syntax.Subject.Text + "In" + Capitalized(syntax.Observer.Text)
        + (syntax.Via is { } via ? "Via" + Capitalized(via.Text) : string.Empty)
        + (syntax.Basis is { } basis ? "Basis" + Capitalized(basis.Text) : string.Empty);

    private static string Capitalized(string name) =>
        name.Length == 0 ? name : char.ToUpperInvariant(name[0]) + name.Substring(1);

    private bool IsFree(IdentifierSyntax name)
    {
        var existing = _scope.Find(name.Text);
        if (existing is null)
        {
            return true;
        }

        _diagnostics.Error(LanguageDiagnosticCodes.DuplicateName, name.Span,
            $"'{name.Text}' is already declared as a {existing.KindName} at line {Line(existing.NameSpan)}; names share one namespace");
        return false;
    }

    private string Line(TextSpan span) => _source.GetLinePosition(span.Start).Line.ToString(CultureInfo.InvariantCulture);
}
