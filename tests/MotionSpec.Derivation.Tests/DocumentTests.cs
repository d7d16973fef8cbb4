using MotionSpec.Derivation.Rendering;
using MotionSpec.Derivation.Tests.Support;

namespace MotionSpec.Derivation.Tests;

/// <summary>The Markdown and LaTeX documents: what they say, that their math parses, that the LaTeX compiles.</summary>
public class DocumentTests
{
    public static TheoryData<string> AllSpecs => TextFormatTests.AllSpecs;

    [KatexFact]
    public void Every_formula_of_every_markdown_derivation_parses_with_katex()
    {
        var formulas = new List<TexFormulas.Found>();
        foreach (var spec in AllSpecs)
        {
            formulas.AddRange(TexFormulas.FromMarkdown(Specs.Derived(spec, DerivationFormat.Markdown)));
        }

        Assert.True(formulas.Count > 100, $"only {formulas.Count} formulas found");
        var failures = KatexChecker.Check(formulas);
        Assert.True(failures.Count == 0, string.Join("\n", failures.Take(10)));
    }

    [KatexFact]
    public void Every_formula_of_every_latex_derivation_parses_with_katex()
    {
        var formulas = new List<TexFormulas.Found>();
        foreach (var spec in AllSpecs)
        {
            formulas.AddRange(TexFormulas.FromLatex(Specs.Derived(spec, DerivationFormat.Latex)));
        }

        Assert.True(formulas.Count > 100, $"only {formulas.Count} formulas found");
        var failures = KatexChecker.Check(formulas);
        Assert.True(failures.Count == 0, string.Join("\n", failures.Take(10)));
    }

    [KatexFact]
    public void The_checker_itself_rejects_broken_math()
    {
        var failures = KatexChecker.Check([new TexFormulas.Found("\\frac{1}{", false, "broken"), new TexFormulas.Found("\\omega_{B/A}", false, "fine")]);
        Assert.Single(failures);
        Assert.StartsWith("broken:", failures[0], StringComparison.Ordinal);
    }

    [Fact]
    public void Latex_document_compiles_when_a_tex_engine_is_installed()
    {
        // No TeX installation is pulled in for this test; where none is present the KaTeX checks above cover the
        // document's math, and this test checks only the document's frame.
        var latex = Specs.Derived(Specs.Crane, DerivationFormat.Latex);
        var titled = DerivationWriter.Write(Specs.Model(Specs.Turntable), "Crane & co. 100% _safe_ #1", DerivationFormat.Latex);
        Assert.Contains("\\title{Derivation of Crane \\& co. 100\\% \\_safe\\_ \\#1}", titled, StringComparison.Ordinal);
        Assert.StartsWith("% ", latex, StringComparison.Ordinal);
        Assert.Contains("\\documentclass[10pt]{article}", latex, StringComparison.Ordinal);
        Assert.Contains("\\usepackage{amsmath}", latex, StringComparison.Ordinal);
        Assert.EndsWith("\\end{document}\n", latex, StringComparison.Ordinal);
        var usePackages = latex.Split('\n').Where(l => l.StartsWith("\\usepackage", StringComparison.Ordinal)).ToList();
        Assert.Equal(["\\usepackage[T1]{fontenc}", "\\usepackage{amsmath}"], usePackages);

        var engine = new[] { "pdflatex", "lualatex", "xelatex" }.FirstOrDefault(KatexChecker.OnPath);
        if (engine is null)
        {
            return;
        }

        var folder = Directory.CreateTempSubdirectory("motionspec-latex-");
        try
        {
            var file = Path.Combine(folder.FullName, "derivation.tex");
            File.WriteAllText(file, latex);
            var (code, stdout, _) = KatexChecker.Run(engine, "-interaction=nonstopmode", "-halt-on-error", "-output-directory", folder.FullName, file);
            Assert.True(code == 0, engine + " failed:\n" + string.Join("\n", stdout.Split('\n').Where(l => l.StartsWith('!')).Take(10)));
            Assert.True(File.Exists(Path.Combine(folder.FullName, "derivation.pdf")));
        }
        finally
        {
            folder.Delete(recursive: true);
        }
    }

    [Theory]
    [MemberData(nameof(AllSpecs))]
    public void Notation_opens_and_the_caution_closes_every_format(string spec)
    {
        var markdown = Specs.Derived(spec, DerivationFormat.Markdown);
        var latex = Specs.Derived(spec, DerivationFormat.Latex);
        var text = Specs.Derived(spec, DerivationFormat.Text);

        Assert.StartsWith("# Derivation of demo\n\n## How to read this derivation\n", markdown, StringComparison.Ordinal);
        Assert.EndsWith("## Caution\n\n" + MarkdownRenderer.Escape(SafetyCaution.Text) + "\n", markdown, StringComparison.Ordinal);
        Assert.EndsWith(LatexRenderer.Escape(SafetyCaution.Text) + "\n\n\\end{document}\n", latex, StringComparison.Ordinal);
        Assert.Contains("qualified engineer", text, StringComparison.Ordinal);
        Assert.Contains("codes and standards", SafetyCaution.Text, StringComparison.Ordinal);
    }

    [Fact]
    public void Crane_derivation_shows_params_as_written_and_in_si_and_the_cross_term_of_each_composition()
    {
        var model = Specs.Model(Specs.Crane);
        var markdown = Specs.Derived(Specs.Crane, DerivationFormat.Markdown);

        // Params: the text of the spec and the SI value the binder computed.
        Assert.Contains("| `0.6 rpm` | " + SpecSectionValue(model, "w") + " |", markdown, StringComparison.Ordinal);
        Assert.Contains("| `L / 6` |", markdown, StringComparison.Ordinal);

        // hook seen from quay composes boom, trolley and hook: every step after the first carries omega x omega.
        Assert.Contains("link by link along quay \\> boom \\> trolley \\> hook", markdown, StringComparison.Ordinal);
        Assert.Contains("\\omega_{\\mathrm{trolley}/\\mathrm{quay}} \\times \\omega_{\\mathrm{hook}/\\mathrm{trolley}} &=", markdown, StringComparison.Ordinal);
        Assert.Contains("\\alpha_{\\mathrm{hook}/\\mathrm{quay}}\\right]_{\\mathrm{quay}} &= \\alpha_{\\mathrm{trolley}/\\mathrm{quay}} + \\alpha_{\\mathrm{hook}/\\mathrm{trolley}} + \\omega_{\\mathrm{trolley}/\\mathrm{quay}} \\times \\omega_{\\mathrm{hook}/\\mathrm{trolley}}", markdown, StringComparison.Ordinal);

        // Every point report names the five terms and states how its sum was checked; none failed.
        foreach (var name in new[] { "Relative acceleration", "Centripetal acceleration", "Angular-acceleration term", "Coriolis acceleration" })
        {
            Assert.Equal(2, CountOf(markdown, name + " (`"));
        }

        Assert.Equal(2, CountOf(markdown, "Sum of the five terms against the position differentiated twice"));
        Assert.DoesNotContain("CHECK FAILED", markdown, StringComparison.Ordinal);
        Assert.DoesNotContain("not checked", markdown, StringComparison.Ordinal);
        Assert.Contains("Named intermediates", markdown, StringComparison.Ordinal);
    }

    [Fact]
    public void Observer_up_the_tree_and_a_spin_frame_basis_are_composed_and_checked()
    {
        var markdown = Specs.Derived(Specs.HookView, DerivationFormat.Markdown);
        Assert.Contains("Seen from hook, written in the basis of trolley, link by link along hook \\> trolley \\> boom:", markdown, StringComparison.Ordinal);
        // Going up a link, the parent turns the other way as seen from the child.
        Assert.Contains("\\left[\\omega_{\\mathrm{trolley}/\\mathrm{hook}}\\right]_{\\mathrm{trolley}} &= -\\left[\\omega_{\\mathrm{hook}/\\mathrm{trolley}}\\right]_{\\mathrm{trolley}}", markdown, StringComparison.Ordinal);
        Assert.Equal(6, markdown.Split("checked ").Length - 1);
        Assert.DoesNotContain("CHECK FAILED", markdown, StringComparison.Ordinal);
        Assert.DoesNotContain("not checked", markdown, StringComparison.Ordinal);

        // The lens at d = 0.05 m on the imu axis z, imu turning at (a, 0, c) = (swing', 0, psi') relative to the
        // hook: omega x (omega x r) = (a c d, 0, -a^2 d), the vector triple product expanded by hand.
        var text = Specs.Derived(Specs.HookView, DerivationFormat.Text);
        Assert.Contains("lensInHookBasisImu.centripetal = [psi'*swing'/20, 0, -swing'^2/20] in imu", text, StringComparison.Ordinal);
    }

    [Fact]
    public void Title_text_cannot_become_markup()
    {
        var model = Specs.Model(Specs.Turntable);
        var markdown = DerivationWriter.Write(model, "Rig *1* $x$ | `a` <b>", DerivationFormat.Markdown);
        Assert.StartsWith("# Derivation of Rig \\*1\\* \\$x\\$ \\| \\`a\\` \\<b\\>\n", markdown, StringComparison.Ordinal);
        Assert.Empty(TexFormulas.FromMarkdown(markdown.Split('\n')[0]));
    }

    private static string SpecSectionValue(Kinematics.KinematicModel model, string param)
    {
        var symbol = model.Spec.Parameters.Single(p => p.Name == param);
        return Sections.SpecSection.ValueInSi(symbol.Value, symbol.Dimension);
    }

    private static int CountOf(string text, string part)
    {
        var count = 0;
        for (var i = text.IndexOf(part, StringComparison.Ordinal); i >= 0; i = text.IndexOf(part, i + 1, StringComparison.Ordinal))
        {
            count++;
        }

        return count;
    }
}
