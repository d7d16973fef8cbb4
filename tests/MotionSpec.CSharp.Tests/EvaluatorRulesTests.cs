using MotionSpec.CSharp;
using MotionSpec.CSharp.Analysis;

namespace MotionSpec.CSharp.Tests;

/// <summary>
/// The check that stands between the emitter and the user's disk must be able to fail: each snippet breaks
/// one rule and must be caught with the right code at the right place.
/// </summary>
public class EvaluatorRulesTests
{
    private const string Prefix = """
        namespace Probe;

        /// <summary>A probe.</summary>
        public static class Probe
        {
            /// <summary>A vector.</summary>
            /// <param name="X">x</param>
            public readonly record struct V(double X);

            /// <summary>Probe method.</summary>
            /// <param name="a">a</param>
            /// <returns>r</returns>
            public static double F(double a)
            {

        """;

    private const string Suffix = """

            }
        }

        """;

    // The body starts on line 15 of the probe file.
    private const int BodyLine = 15;

    [Fact]
    public void Clean_code_passes_and_its_operations_are_counted()
    {
        var report = EmittedCodeCheck.Check(Prefix + "var v = new V(a); return (a * v.X) + global::System.Math.Sin(a) - -a + (2.0 * 3.0);" + Suffix);

        Assert.Empty(report.Findings);
        // *, +, Sin, -, unary -, + counted; 2.0 * 3.0 is folded by the compiler and is free.
        var method = Assert.Single(report.Methods);
        Assert.Equal("F", method.Method);
        Assert.Equal(6, method.Operations);
        Assert.Equal(1, method.MathCalls);
    }

    [Theory]
    [InlineData("var x = new double[3]; return x[0];", CSharpDiagnosticCodes.HeapAllocation, 9)]
    [InlineData("var o = new object(); return a;", CSharpDiagnosticCodes.HeapAllocation, 9)]
    [InlineData("object o = a; return a;", CSharpDiagnosticCodes.HeapAllocation, 12)]
    [InlineData("System.Func<double> f = () => a; return f();", CSharpDiagnosticCodes.HeapAllocation, 25)]
    [InlineData("var s = $\"{a}\"; return s.Length;", CSharpDiagnosticCodes.HeapAllocation, 9)]
    [InlineData("System.Console.WriteLine(a); return a;", CSharpDiagnosticCodes.ForbiddenCall, 1)]
    [InlineData("return System.DateTime.Now.Second;", CSharpDiagnosticCodes.ForbiddenCall, 8)]
    [InlineData("var x = 0.0; for (var i = 0; i < 3; i++) { x += a; } return x;", CSharpDiagnosticCodes.LoopOrJump, 14)]
    [InlineData("var x = 0.0; while (x < a) { x += 1; } return x;", CSharpDiagnosticCodes.LoopOrJump, 14)]
    [InlineData("again: if (a > 0) { goto again; } return a;", CSharpDiagnosticCodes.LoopOrJump, 1)]
    [InlineData("return a > 1 ? F(a - 1) : a;", CSharpDiagnosticCodes.Recursion, 16)]
    [InlineData("if (a < 0) { throw new System.ArgumentException(); } return a;", CSharpDiagnosticCodes.ForbiddenConstruct, 14)]
    [InlineData("return System.Linq.Enumerable.Sum(new[] { a });", CSharpDiagnosticCodes.ForbiddenCall, 8)]
    public void A_breach_is_reported_with_its_code_and_place(string body, string code, int column)
    {
        var report = EmittedCodeCheck.Check(Prefix + body + Suffix);

        Assert.False(report.Passed);
        Assert.Contains(report.Findings, f => f.Code == code && f.Line == BodyLine && f.Column == column);
    }

    [Fact]
    public void Code_the_compiler_rejects_is_reported_as_MOT5110()
    {
        var report = EmittedCodeCheck.Check(Prefix + "return b;" + Suffix);

        var finding = Assert.Single(report.Findings);
        Assert.Equal(CSharpDiagnosticCodes.CompilerRejected, finding.Code);
        Assert.Contains("CS0103", finding.Message, StringComparison.Ordinal);
        Assert.Equal((BodyLine, 8), (finding.Line, finding.Column));
    }

    [Fact]
    public void A_warning_counts_as_a_failure()
    {
        // An unused local is warning CS0168/CS0219 in C#; evaluators must compile without any.
        var report = EmittedCodeCheck.Check(Prefix + "var unused = 1.0; return a;" + Suffix);

        Assert.Contains(report.Findings, f => f.Code == CSharpDiagnosticCodes.CompilerRejected && f.Message.Contains("CS0219", StringComparison.Ordinal));
    }

    [Fact]
    public void A_public_member_without_documentation_fails()
    {
        var report = EmittedCodeCheck.Check("namespace N;\n/// <summary>c</summary>\npublic static class C\n{\n    public static double F(double a) => a;\n}\n");

        Assert.Contains(report.Findings, f => f.Message.Contains("CS1591", StringComparison.Ordinal));
    }
}
