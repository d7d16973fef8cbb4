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
        $"\\begin{{bmatrix}} {LatexPrinter.Print(x)} \\\\ {LatexPrinter.Print(y)} \\\\ {LatexPrinter.Print(z)} \\end{{bmatrix}}";

    public static string Matrix(Matrix3Expr m)
    {
        var rows = Enumerable.Range(0, 3).Select(r => string.Join(" & ", Enumerable.Range(0, 3).Select(c => LatexPrinter.Print(m[r, c]))));
        return "\\begin{bmatrix} " + string.Join(" \\\\ ", rows) + " \\end{bmatrix}";
    }

    /// <summary>The derivative taken in frame F: <c>d/dt|_F</c> applied to <paramref name="body"/>.</summary>
    public static string DerivativeIn(FrameSymbol frame, string body, int order = 1) =>
        order == 1
            ? $"\\left.\\frac{{d{body}}}{{dt}}\\right|_{{{Name(frame)}}}"
            : $"\\left.\\frac{{d^{{{order}}}{body}}}{{dt^{{{order}}}}}\\right|_{{{Name(frame)}}}";

    public static string Symbol(Expr symbol) => LatexPrinter.Print(symbol);
}
