using System.Globalization;

namespace MotionSpec.Symbolic;

/// <summary>
/// Prints expressions in the spec language's own syntax, re-parseable: marks, calls, ^ (right-associative,
/// exponent a number or a parenthesised fraction), unary minus, * /, + -, with parentheses only where
/// precedence needs them.
/// </summary>
public static class TextPrinter
{
    /// <summary>The expression in spec syntax, for example "r'' - r*theta'^2".</summary>
    public static string Print(Expr e) => new Machine().Run(e);

    /// <summary>Precedence levels of the spec syntax, low to high.</summary>
    private static class Level
    {
        public const int Sum = 1;
        public const int Product = 2;
        public const int Unary = 3;
        public const int Power = 4;
        public const int Atom = 5;
    }

    private sealed class Machine : PrintMachine
    {
        protected override int Precedence(Expr node) => node switch
        {
            Number n => n.Value.IsInteger ? (n.Value.Sign < 0 ? Level.Unary : Level.Atom) : Level.Product,
            Sum => Level.Sum,
            Product p => IsNegatedAtom(p) ? Level.Unary : Level.Product,
            Power pw => pw.Exponent.Sign < 0 ? Level.Product : Level.Power,
            _ => Level.Atom,
        };

        protected override void Expand(Expr node)
        {
            switch (node)
            {
                case Number n:
                    Text(n.Value.ToString());
                    break;
                case PiConstant:
                    Text("pi");
                    break;
                case Symbol s:
                    Text(SymbolText(s));
                    break;
                case Sum s:
                    {
                        bool first = true;
                        foreach (var term in ReadingOrder(s))
                        {
                            if (first)
                            {
                                Child(term, Level.Sum);
                                first = false;
                            }
                            else if (IsNegativeTerm(term))
                            {
                                Text(" - ");
                                Child(-term, Level.Product);
                            }
                            else
                            {
                                Text(" + ");
                                Child(term, Level.Product);
                            }
                        }

                        break;
                    }

                case Power pw when pw.Exponent.Sign > 0:
                    Child(pw.Base, Level.Atom);
                    Text("^");
                    Text(pw.Exponent.IsInteger
                        ? pw.Exponent.ToString()
                        : "(" + pw.Exponent.ToString() + ")");
                    break;
                case Power or Product:
                    Fraction(node);
                    break;
                case Call c:
                    Text(Name(c.Function));
                    Text("(");
                    for (int i = 0; i < c.Children.Length; i++)
                    {
                        if (i > 0)
                        {
                            Text(", ");
                        }

                        Child(c.Children[i], 0);
                    }

                    Text(")");
                    break;
            }
        }

        private void Fraction(Expr node)
        {
            var (negative, magnitude, numerator, denominator) = SplitFraction(node);
            if (negative)
            {
                Text("-");
            }

            bool first = true;
            if (!magnitude.Numerator.IsOne || numerator.Count == 0)
            {
                Text(magnitude.Numerator.ToString(CultureInfo.InvariantCulture));
                first = false;
            }

            foreach (var f in numerator)
            {
                if (!first)
                {
                    Text("*");
                }

                Child(f, Level.Unary);
                first = false;
            }

            // The numeric denominator is divided out on its own (x/2/(y + 1), not x/(2*(y + 1))), as the node
            // holds it: one coefficient in front, every sum factor free of numbers it could share.
            if (!magnitude.Denominator.IsOne)
            {
                Text("/");
                Text(magnitude.Denominator.ToString(CultureInfo.InvariantCulture));
            }

            if (denominator.Count == 0)
            {
                return;
            }

            Text("/");
            if (denominator.Count > 1)
            {
                Text("(");
            }

            first = true;
            foreach (var f in denominator)
            {
                if (!first)
                {
                    Text("*");
                }

                Child(f, denominator.Count > 1 ? Level.Unary : Level.Power);
                first = false;
            }

            if (denominator.Count > 1)
            {
                Text(")");
            }
        }

        private static bool IsNegatedAtom(Product p) =>
            p.Children.Length == 2 && p.Children[0] is Number n && n.Value == Rational.MinusOne && p.Children[1] is Symbol or PiConstant or Call;
    }

    internal static string SymbolText(Symbol s) => s.Order switch
    {
        1 => s.Name + "'",
        2 => s.Name + "''",
        _ => s.Name,
    };

    internal static string Name(Function f) => f switch
    {
        Function.Sin => "sin",
        Function.Cos => "cos",
        Function.Tan => "tan",
        Function.Asin => "asin",
        Function.Acos => "acos",
        Function.Atan => "atan",
        Function.Atan2 => "atan2",
        Function.Sqrt => "sqrt",
        Function.Exp => "exp",
        _ => "ln",
    };
}
