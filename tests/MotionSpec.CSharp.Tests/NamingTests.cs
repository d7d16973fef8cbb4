using MotionSpec.CSharp.Naming;
using MotionSpec.CSharp.Text;

namespace MotionSpec.CSharp.Tests;

public class NamingTests
{
    [Theory]
    [InlineData("harbour-crane.motion", "HarbourCrane")]
    [InlineData("/specs/2-link arm.motion", "_2LinkArm")]
    [InlineData("rover_v2.motion", "RoverV2")]
    [InlineData("---.motion", "Spec")]
    [InlineData("C:\\work\\turntable.motion", "Turntable")]
    public void Class_name_comes_from_the_file_name(string path, string expected) =>
        Assert.Equal(expected, ClassNameFromFile.Derive(path));

    [Fact]
    public void A_coord_named_like_a_generated_rate_yields_to_it()
    {
        var names = EvaluatorNames.Choose("Crane", [], ["psi", "psi_dot"], []);

        Assert.Equal(new CoordNames("psi", "psi_dot", "psi_ddot"), names.Coords[0]);
        Assert.Equal(new CoordNames("psi_dot_", "psi_dot__dot", "psi_dot__ddot"), names.Coords[1]);
        var rename = Assert.Single(names.Renames);
        Assert.Equal(("coord", "psi_dot", "psi_dot_", 1), (rename.What, rename.SpecName, rename.CSharpName, rename.Index));
    }

    [Fact]
    public void The_order_of_declaration_does_not_decide_who_keeps_the_rate_name()
    {
        var names = EvaluatorNames.Choose("Crane", [], ["psi_dot", "psi"], []);

        Assert.Equal("psi_dot_", names.Coords[0].Value);
        Assert.Equal(new CoordNames("psi", "psi_dot", "psi_ddot"), names.Coords[1]);
    }

    [Fact]
    public void Names_of_the_generated_api_and_the_class_are_renamed_in_every_scope()
    {
        var names = EvaluatorNames.Choose("Crane", ["Vec3", "Crane", "Default", "L"], ["State", "X"], ["state", "vec3_", "crane", "tipInQuay"]);

        Assert.Equal(["Vec3_", "Crane_", "Default_", "L"], names.Parameters);
        Assert.Equal(["State_", "X_"], names.Coords.Select(c => c.Value));
        Assert.Equal(["State_", "Vec3_", "Crane_", "TipInQuay"], names.ReportMethods);
        Assert.Equal(7, names.Renames.Count);
    }

    [Fact]
    public void Report_methods_that_clash_once_upper_cased_are_kept_apart()
    {
        var names = EvaluatorNames.Choose("Crane", [], [], ["tip", "Tip", "math"]);

        Assert.Equal(["Tip", "Tip_", "Math_"], names.ReportMethods);
    }

    [Fact]
    public void A_class_named_like_a_generated_type_is_renamed()
    {
        var names = EvaluatorNames.Choose("State", [], [], []);

        Assert.Equal("State_", names.ClassName);
        Assert.Equal("class", Assert.Single(names.Renames).What);
    }

    [Theory]
    [InlineData("class", "@class")]
    [InlineData("double", "@double")]
    [InlineData("value", "@value")]
    [InlineData("psi", "psi")]
    public void Keywords_are_escaped(string name, string expected) => Assert.Equal(expected, CSharpIdentifier.Escape(name));

    [Theory]
    [InlineData("*/ } class X { /*", "*/ } class X { /*")]
    [InlineData("line\nbreak\r\u0085\u2028\u2029end", "line break    end")]
    [InlineData("bidi\u202Eoverride", "bidi override")]
    [InlineData("Kran f\u00FCr den Hafen \U0001F3D7", "Kran f\u00FCr den Hafen \U0001F3D7")]
    public void Comment_text_stays_on_its_line(string text, string expected) => Assert.Equal(expected, CommentText.OneLine(text));

    [Fact]
    public void Half_a_surrogate_pair_is_dropped() => Assert.Equal("lone half", CommentText.OneLine("lone\uD800half"));

    [Fact]
    public void Documentation_text_is_escaped_for_xml() =>
        Assert.Equal("a &lt;b&gt; &amp; c", CommentText.Xml("a <b> & c"));
}
