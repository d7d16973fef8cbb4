using System.Text;
using MotionSpec.Language.Binding;
using MotionSpec.Language.Diagnostics;
using MotionSpec.Language.Text;

namespace MotionSpec.Language.Tests;

/// <summary>Runs the front end the way the pipeline does and shows diagnostics as the command line prints them.</summary>
internal static class Compile
{
    public static (BoundSpec? Spec, IReadOnlyList<Diagnostic> Diagnostics) Run(string text)
    {
        var bag = new DiagnosticBag();
        var source = FrontEnd.Decode("test.motion", Encoding.UTF8.GetBytes(text), bag);
        if (source is null)
        {
            return (null, bag.Items);
        }

        var spec = FrontEnd.Run(source, bag);
        return (spec, bag.Items);
    }

    public static BoundSpec Clean(string text)
    {
        var (spec, diagnostics) = Run(text);
        Assert.True(diagnostics.Count == 0, "unexpected diagnostics:\n" + string.Join("\n", diagnostics.Select(Format)));
        Assert.NotNull(spec);
        return spec!;
    }

    public static string Format(Diagnostic d)
    {
        var at = d.Start ?? new LinePosition(0, 0);
        return $"({at.Line},{at.Column}): {(d.IsError ? "error" : "warning")} {d.Code}: {d.Message}";
    }

    public static IReadOnlyList<string> Errors(string text) => Run(text).Diagnostics.Select(Format).ToList();

    /// <summary>Asserts that the spec reports <paramref name="code"/> starting at the given line and column.</summary>
    public static Diagnostic Expect(string text, string code, int line, int column)
    {
        var diagnostics = Run(text).Diagnostics;
        var match = diagnostics.FirstOrDefault(d => d.Code == code);
        Assert.True(match is not null, $"expected {code}, got:\n" + string.Join("\n", diagnostics.Select(Format)));
        Assert.Equal(new LinePosition(line, column), match!.Start);
        return match;
    }
}
