using MotionSpec.Kinematics;
using MotionSpec.Language.Binding.Symbols;
using MotionSpec.Symbolic;

namespace MotionSpec.Derivation.Document;

/// <summary>The LaTeX math of the derivation's notation: frame names, omega and alpha, bases, column vectors.</summary>
internal static class Tex
{
    /// <summary>A spec name in upright letters (names are ASCII identifiers; underscores are escaped).</summary>
    public static string Name(string name) => "\\mathrm{" + name.Replace("_", "\\_", StringComparison.Ordinal) + "}";

    public static string Name(FrameSymbol frame) => Name(frame.Name);

    public static string Omega(FrameSymbol frame, FrameSymbol relativeTo) => $"\\omega_{{{Name(frame)}/{Name(relativeTo)}}}";

    public static string Alpha(FrameSymbol frame, FrameSymbol relativeTo) => $"\\alpha_{{{Name(frame)}/{Name(relativeTo)}}}";

    /// <summary><c>[v]_C</c>: the components of a vector in C's basis.</summary>
    public static string In(string vector, FrameSymbol basis) => $"\\left[{vector}\\right]_{{{Name(basis)}}}";

    /// <summary>A column of three components.</summary>
    public static string Column(Vector3Expr v) => Column(v.X, v.Y, v.Z);

    public static string Column(Expr x, Expr y, Expr z) =>
        $"\\begin{{bmatrix}} {Cell(x)} \\\\ {Cell(y)} \\\\ {Cell(z)} \\end{{bmatrix}}";

    /// <summary>Largest expression, in nodes written out as a tree, that a cell shows in full.</summary>
    public const int CellNodeLimit = 2000;

    /// <summary>Printed width (in LaTeX source characters) beyond which a sum is broken over several lines.</summary>
    public const int LineWidth = 80;

    /// <summary>
    /// One entry of a column or matrix. A long sum is broken between its terms into lines of an
    /// <c>aligned</c> block inside the entry, so that wide closed forms stay on the page.
    /// </summary>
    public static string Cell(Expr e)
    {
        // A long chain's composed forms are linear in size as shared graphs but grow geometrically written out;
        // past this size a cell says so instead of filling the document (the text format names their parts).
        var written = ExprMetrics.TreeNodeCount(e);
        if (written > CellNodeLimit)
        {
            return "\\text{(" + written.ToString("N0", System.Globalization.CultureInfo.InvariantCulture)
                + " terms and factors written out; see derive --format text)}";
        }

        var whole = LatexPrinter.Print(e);
        if (whole.Length <= LineWidth || e is not Sum sum)
        {
            return whole;
        }

        var lines = new List<string>();
        var line = new System.Text.StringBuilder();
        foreach (var term in sum.Terms)
        {
            var negative = IsNegative(term);
            var text = LatexPrinter.Print(negative ? -term : term);
            if (term is Sum)
            {
                text = "\\left(" + text + "\\right)";
            }

            var piece = line.Length == 0 && lines.Count == 0
                ? (negative ? "-" : string.Empty) + text
                : (negative ? " - " : " + ") + text;
            if (line.Length > 0 && line.Length + piece.Length > LineWidth)
            {
                lines.Add(line.ToString());
                line.Clear();
            }

            line.Append(piece);
        }

        lines.Add(line.ToString());
        return "\\begin{aligned} &" + string.Join(" \\\\ &\\quad ", lines) + " \\end{aligned}";
    }

    private static bool IsNegative(Expr term) =>
        (term.TryGetRational(out var value) && value.Sign < 0)
        || (term is Product product && product.Factors[0].TryGetRational(out var coefficient) && coefficient.Sign < 0);

    public static string Matrix(Matrix3Expr m)
    {
        var rows = Enumerable.Range(0, 3).Select(r => string.Join(" & ", Enumerable.Range(0, 3).Select(c => Cell(m[r, c]))));
        return "\\begin{bmatrix} " + string.Join(" \\\\ ", rows) + " \\end{bmatrix}";
    }

    /// <summary>The derivative taken in frame F: <c>d/dt|_F</c> applied to <paramref name="body"/>.</summary>
    public static string DerivativeIn(FrameSymbol frame, string body, int order = 1) =>
        order == 1
            ? $"\\left.\\frac{{d{body}}}{{dt}}\\right|_{{{Name(frame)}}}"
            : $"\\left.\\frac{{d^{{{order}}}{body}}}{{dt^{{{order}}}}}\\right|_{{{Name(frame)}}}";

    public static string Symbol(Expr symbol) => LatexPrinter.Print(symbol);
}
