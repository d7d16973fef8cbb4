using MotionSpec.Language.Binding;
using MotionSpec.Language.Binding.Expressions;
using MotionSpec.Language.Binding.Symbols;
using C = MotionSpec.Language.Diagnostics.LanguageDiagnosticCodes;

namespace MotionSpec.Language.Tests;

public class BinderTests
{
    private static string Codes(string text) => string.Join(",", Compile.Run(text).Diagnostics.Select(d => d.Code));

    [Fact]
    public void Crane_binds_to_the_model_later_stages_read()
    {
        var spec = Compile.Clean(Specs.Crane);
        Assert.Equal("Slewing crane, trolley and hook \"demo\"", spec.Title);
        Assert.Equal(["Lj", "slew", "drop", "tilt"], spec.Parameters.Select(p => p.Name));
        Assert.Equal(24.0, spec.Parameters[0].Value);
        Assert.Equal(3.0, spec.Parameters[2].Value);
        Assert.True(spec.Parameters[2].IsDerived);
        Assert.False(spec.Parameters[0].IsDerived);
        Assert.Equal(new[] { CoordKind.Angle, CoordKind.Length, CoordKind.Angle }, spec.Coords.Select(c => c.Kind));
        Assert.Equal([0, 1, 2], spec.Coords.Select(c => c.Index));

        var ground = spec.Frames[0];
        var jib = spec.Frames[1];
        var carriage = spec.Frames[2];
        var block = spec.Frames[3];
        Assert.Null(ground.Parent);
        Assert.Same(ground, jib.Parent);
        Assert.Same(jib, carriage.Parent);
        Assert.Equal(3, block.Depth);
        Assert.Same(ground, block.Root);
        Assert.Equal([jib], ground.Children);
        Assert.Equal(2, jib.Rotations.Count);
        Assert.Equal(Axis.Z, jib.Rotations[0].Axis);
        Assert.Equal(Axis.Y, jib.Rotations[1].Axis);
        Assert.IsType<BoundUnary>(jib.Rotations[1].Angle);
        Assert.Null(jib.Origin);

        // A bare bracket in 'origin at' is in the parent's basis.
        var origin = Assert.IsType<BoundBracket>(carriage.Origin);
        Assert.Same(jib, origin.Basis);
        Assert.False(origin.BasisWritten);

        var hookTip = spec.Points[0];
        Assert.Same(block, hookTip.Frame);
        Assert.Equal(Dimension.LengthDimension, hookTip.Position.Dimension);
        Assert.Same(block, Assert.IsType<BoundBracket>(hookTip.Position).Basis);

        Assert.Equal(["hookTipInGround", "hookTipInGroundViaCarriage", "sliderLoad", "blockInGround"], spec.Reports.Select(r => r.Name));
        var plain = spec.Reports[0];
        Assert.Equal(ReportKind.Point, plain.Kind);
        Assert.Same(block, plain.Via);
        Assert.Same(ground, plain.Basis);
        Assert.Same(carriage, spec.Reports[1].Via);
        Assert.Same(jib, spec.Reports[2].Basis);
        var frameReport = spec.Reports[3];
        Assert.Equal(ReportKind.Frame, frameReport.Kind);
        Assert.Null(frameReport.Via);
        Assert.Null(frameReport.Point);
        Assert.Same(block, frameReport.SubjectFrame);
        Assert.Equal("sliderLoad", Specs.Crane.Substring(spec.Reports[2].NameSpan.Start, spec.Reports[2].NameSpan.Length));
        Assert.Equal("hookTip", Specs.Crane.Substring(plain.NameSpan.Start, plain.NameSpan.Length));
    }

    [Fact]
    public void Spin_brackets_are_in_the_frames_own_basis_and_axes_are_exact()
    {
        var spec = Compile.Clean(Specs.Rover);
        var table = spec.Frames[1];
        var sensor = spec.Frames[2];
        Assert.Equal(new[] { new ExactNumber(0, 1, 0), new ExactNumber(0, 1, 0), new ExactNumber(1, 1, 0) }, table.Rotations[0].Direction);
        Assert.Null(table.Rotations[0].Axis);
        Assert.True(Assert.IsType<BoundBracket>(table.Origin).BasisWritten);
        Assert.Same(spec.Frames[0], Assert.IsType<BoundBracket>(table.Origin).Basis);
        var spin = Assert.IsType<BoundBracket>(sensor.Spin);
        Assert.Same(sensor, spin.Basis);
        Assert.True(sensor.IsSpin);
        Assert.Equal(Dimension.Rate, spin.Dimension);
        var rate = Assert.IsType<BoundCoordReference>(spin.X);
        Assert.Equal(1, rate.Marks);
        Assert.Equal(["lensInSensor", "lensInTableBasisSensor", "rimInDeckViaTable"], spec.Reports.Select(r => r.Name));
        Assert.Same(sensor, spec.Reports[1].Basis);
    }

    [Theory]
    [InlineData("param a = t * 2")]
    [InlineData("param L = 18 m\nparam a = L / 6")]
    [InlineData("param L = 18 m\nparam a = 0.5 * L")]
    [InlineData("param a = pi")]
    [InlineData("param b = 2\nparam a = b * 3")]
    public void Products_with_a_free_side_are_free(string text)
    {
        var (spec, diagnostics) = Compile.Run(text);
        if (text.Contains('t'))
        {
            // t is not allowed in a param, but a let shows the rule.
            spec = Compile.Clean("let a = t * 2");
            Assert.True(spec.Lets[0].Dimension.IsFree);
            return;
        }

        Assert.Empty(diagnostics);
        Assert.True(spec!.Parameters[^1].Dimension.IsFree);
    }

    [Theory]
    [InlineData("let a = t^2 / 2", true, 0, 0)]
    [InlineData("let a = 1 m + 2", false, 1, 0)]
    [InlineData("let a = 2 + 1 s", false, 0, 1)]
    [InlineData("let a = sqrt(4 m^2 / 1 s^2)", false, 1, -1)]
    [InlineData("let a = sin(2) * 1 m", false, 1, 0)]
    [InlineData("coord s : length\nlet a = s''", false, 1, -2)]
    [InlineData("coord q : angle\nlet a = q'", false, 0, -1)]
    [InlineData("coord q : angle\nlet a = q^(1/2)", false, 0, 0)]
    [InlineData("let a = (2 m)^-2", false, -2, 0)]
    [InlineData("let a = atan2(1 m, 2)", false, 0, 0)]
    [InlineData("let a = -(1 m)", false, 1, 0)]
    public void Dimensions_follow_the_rules(string text, bool free, int length, int time)
    {
        var spec = Compile.Clean(text);
        Assert.Equal(free ? Dimension.Free : Dimension.Of(length, time), spec.Lets[^1].Dimension);
    }

    [Theory]
    [InlineData("param b = 1\nparam a = b + a", C.UnknownName)]
    [InlineData("param a = b\nparam b = 1", C.UnknownName)]
    [InlineData("frame f\nparam f = 1", C.DuplicateName)]
    [InlineData("frame f\npoint f in f at [0, 0, 0]", C.DuplicateName)]
    [InlineData("param tipInF = 1\nframe f\npoint tip in f at [0, 0, 0]\nreport tip in f", C.DuplicateName)]
    [InlineData("coord q : angle\nparam a = q", C.ParamNotConstant)]
    [InlineData("let a = t'", C.MarkOnNonCoord)]
    [InlineData("coord q : angle\nlet k = q\nparam a = k", C.ParamNotConstant)]
    [InlineData("frame f\nlet a = f", C.WrongKind)]
    [InlineData("frame f\npoint p in f at [0, 0, 0]\nlet a = p", C.WrongKind)]
    [InlineData("frame f\npoint p in f at [0, 0, 0]\nframe g in p", C.WrongKind)]
    [InlineData("frame f\nframe g in f {\n origin at g.x * 1 m\n}", C.FrameInOwnBlock)]
    [InlineData("coord q : angle\nlet a = q^pi", C.ExponentNotNumbers)]
    [InlineData("param k = 2\nlet a = 2^k", C.ExponentNotNumbers)]
    [InlineData("let a = t / 0", C.DivisionByZero)]
    [InlineData("param z = 0\nlet a = t / z", C.DivisionByZero)]
    [InlineData("param a = 1e400", C.NonFiniteConstant)]
    [InlineData("param a = 10^400", C.NonFiniteConstant)]
    [InlineData("param a = ln(0)", C.NonFiniteConstant)]
    [InlineData("param a = asin(2)", C.NonFiniteConstant)]
    [InlineData("let a = (1 m)^(1/2)", C.FractionalPowerOfDimension)]
    [InlineData("let a = sqrt(1 m^3)", C.SqrtOddDimension)]
    [InlineData("let a = exp(1 s)", C.FunctionArgumentDimension)]
    [InlineData("let a = 1 m - 1 s", C.DimensionMismatch)]
    [InlineData("frame f\npoint p in f at [1 s, 0, 0]", C.WrongDimension)]
    [InlineData("frame f\nframe g in f {\n spin [1 m, 0, 0]\n}", C.WrongDimension)]
    [InlineData("frame f\nframe g in f {\n rotate about [1 m, 0, 0] by 1\n}", C.WrongDimension)]
    [InlineData("frame f\nframe g in f {\n rotate about [1, 0, 0] in f by 1\n}", C.AxisNotNumbers)]
    [InlineData("param k = 1\nframe f\nframe g in f {\n rotate about [k, 0, 0] by 1\n}", C.AxisNotNumbers)]
    [InlineData("frame f\nframe g in f {\n spin [1, 0, 0] in f\n}", C.SpinNotBracket)]
    [InlineData("frame f\npoint p in f at dot(f.x, 1) * f.x", C.VectorExpected)]
    [InlineData("frame f\nlet a = dot(f.x, f.y)", C.ScalarExpected)]
    [InlineData("frame f\npoint p in f at sin(f.x)", C.ScalarExpected)]
    [InlineData("frame f\npoint p in f at f.x + 1", C.InvalidVectorArithmetic)]
    [InlineData("frame f\npoint p in f at 1 / f.x", C.InvalidVectorArithmetic)]
    [InlineData("frame f\npoint p in f at [f.x, 0, 0]", C.ScalarExpected)]
    [InlineData("let a = cross(1, 2)", C.ArgumentCount + "|" + C.VectorExpected)]
    [InlineData("frame a\nframe b in a\nframe c\nreport b in a basis c", C.ReportAcrossTrees)]
    [InlineData("frame a\nframe b in a\nreport b in a as x\nreport b in a as x", C.DuplicateName)]
    [InlineData("frame f\nframe g in f {\n origin at [1, 0, 0]\n rotate about z by 1\n spin [1, 0, 0]\n}", C.RotateAndSpin)]
    public void Name_and_dimension_errors(string text, string codes)
    {
        var found = Codes(text);
        Assert.True(codes.Split('|').Any(found.Contains), $"expected {codes}, got {found}");
    }

    [Fact]
    public void Report_names_may_differ_in_case_beyond_the_first_letter()
    {
        var spec = Compile.Clean("frame a\npoint p in a at [0, 0, 0]\nreport p in a as tipLoad\nreport p in a as tipload");
        Assert.Equal(2, spec.Reports.Count);
    }

    [Fact]
    public void Suggestions_pick_the_closest_declared_name_of_the_right_kind()
    {
        static string? Suggest(string text) => Compile.Run(text).Diagnostics[0].Suggestion;

        Assert.Equal("psi", Suggest("coord psi : angle\nlet a = pis"));          // adjacent swap counts 1
        Assert.Equal("psa", Suggest("param psa = 1\nparam psb = 1\nlet a = psc")); // tie: earlier declaration
        Assert.Null(Suggest("param b = 1\nlet a = c"));                          // distance must be below the length
        Assert.Null(Suggest("param length = 1\nlet a = lxnxxh"));                 // more than two edits
        Assert.Equal("trolley", Suggest("param trolly = 1\nframe trolley\nframe hook in trolly2"));
        Assert.Null(Suggest("coord q : angle\nparam a = qq"));                    // a param may only name params
    }

    [Fact]
    public void Rotation_after_spin_is_reported_at_the_later_statement()
    {
        var d = Compile.Expect("frame f\nframe g in f {\n spin [1, 0, 0]\n rotate about z by 1\n}", C.RotateAndSpin, 4, 2);
        Assert.Contains("'g'", d.Message);
    }

    [Fact]
    public void Frames_without_rotation_keep_their_parents_orientation_and_omitted_origin_is_null()
    {
        var spec = Compile.Clean("frame f\nframe g in f\nframe h in g { }");
        Assert.All(spec.Frames, f => Assert.Empty(f.Rotations));
        Assert.All(spec.Frames, f => Assert.Null(f.Origin));
        Assert.All(spec.Frames, f => Assert.Null(f.Spin));
    }

    [Fact]
    public void Lets_stay_references_for_later_stages()
    {
        var spec = Compile.Clean(Specs.Crane);
        var angle = spec.Frames[1].Rotations[0].Angle;
        Assert.Same(spec.Lets[0], Assert.IsType<BoundLetReference>(angle).Let);
    }

    [Fact]
    public void Derived_params_are_computed_at_the_specs_values()
    {
        var spec = Compile.Clean("param L = 18 m\nparam h = L / 6 + 2^-1 * 1 m\nparam k = -2^2");
        Assert.Equal(3.5, spec.Parameters[1].Value);
        Assert.True(spec.Parameters[1].IsDerived);
        Assert.Equal(-4.0, spec.Parameters[2].Value);
    }

    [Fact]
    public void Power_keeps_its_exact_rational_exponent()
    {
        var spec = Compile.Clean("coord q : angle\nlet a = q^(2/4)\nlet b = q^-2");
        var half = Assert.IsType<BoundPower>(spec.Lets[0].Definition);
        Assert.Equal(1, (int)half.ExponentNumerator);
        Assert.Equal(2, (int)half.ExponentDenominator);
        var inverse = Assert.IsType<BoundPower>(spec.Lets[1].Definition);
        Assert.Equal(-2, (int)inverse.ExponentNumerator);
    }
}
