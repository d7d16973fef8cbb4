namespace MotionSpec.Symbolic;

/// <summary>
/// Prints an expression as a C# expression for double or float: Math or MathF calls, small integer powers
/// as products, square roots as Sqrt, exact-as-possible literals, symbol names from the caller.
/// </summary>
public static class CSharpPrinter
{
    /// <summary>The expression as C#; nameOf gives the C# text for each symbol (a local, a field, a parameter).</summary>
    public static string Print(Expr e, NumericType type, Func<Symbol, string> nameOf)
    {
        if (nameOf is null)
        {
            throw new ArgumentNullException(nameof(nameOf));
        }

        return new Machine(type, nameOf).Run(e);
    }

    private static class Level
    {
        public const int Sum = 1;
        public const int Product = 2;
        public const int Unary = 3;
        public const int Primary = 5;
    }

    private sealed class Machine(NumericType type, Func<Symbol, string> nameOf) : PrintMachine
    {
        private readonly string _math = type == NumericType.Float ? "MathF." : "Math.";

        private string One => CSharpLiterals.Of(Rational.One, type);

        protected override int Precedence(Expr node) => node switch
        {
            Number n => n.Value.Sign < 0 ? Level.Unary : Level.Primary,
            Sum => Level.Sum,
            Product => Level.Product,
            Power pw when SmallInteger(pw.Exponent, out int k) && k != 1 => Level.Product,
            _ => Level.Primary,
        };

        protected override void Expand(Expr node)
        {
            switch (node)
            {
                case Number n:
                    Text(CSharpLiterals.Of(n.Value, type));
                    break;
                case PiConstant:
                    Text(_math + "PI");
                    break;
                case Symbol s:
                    Text(nameOf(s));
                    break;
                case Sum s:
                    for (int i = 0; i < s.Children.Length; i++)
                    {
                        var term = s.Children[i];
                        if (i == 0)
                        {
                            Child(term, Level.Sum);
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
                case Product p:
                    ProductText(p);
                    break;
                case Power pw:
                    PowerText(pw);
                    break;
                case Call c:
                    Text(_math + FunctionName(c.Function) + "(");
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

        private void ProductText(Product p)
        {
            var (negative, magnitude, numerator, denominator) = SplitFraction(p);
            bool first = true;
            if (negative)
            {
                Text("-");
            }

            if (!magnitude.IsOne || numerator.Count == 0)
            {
                Text(CSharpLiterals.Of(magnitude, type));
                first = false;
            }

            foreach (var f in numerator)
            {
                if (!first)
                {
                    Text(" * ");
                }

                Child(f, first && negative ? Level.Unary : Level.Product);
                first = false;
            }

            if (denominator.Count == 0)
            {
                return;
            }

            Text(" / ");
            if (denominator.Count > 1)
            {
                Text("(");
            }

            for (int i = 0; i < denominator.Count; i++)
            {
                if (i > 0)
                {
                    Text(" * ");
                }

                Child(denominator[i], denominator.Count > 1 ? Level.Product : Level.Unary);
            }

            if (denominator.Count > 1)
            {
                Text(")");
            }
        }

        private void PowerText(Power pw)
        {
            var e = pw.Exponent;
            if (SmallInteger(e, out int k))
            {
                // The same association as DoubleSemantics.Pow, so emitted code and the evaluators agree.
                int m = Math.Abs(k);
                if (k < 0)
                {
                    Text(One + " / ");
                    if (m > 1)
                    {
                        Text("(");
                    }
                }

                if (m == 4)
                {
                    Text("(");
                    Child(pw.Base, Level.Primary);
                    Text(" * ");
                    Child(pw.Base, Level.Primary);
                    Text(") * (");
                    Child(pw.Base, Level.Primary);
                    Text(" * ");
                    Child(pw.Base, Level.Primary);
                    Text(")");
                }
                else
                {
                    for (int i = 0; i < m; i++)
                    {
                        if (i > 0)
                        {
                            Text(" * ");
                        }

                        Child(pw.Base, Level.Primary);
                    }
                }

                if (k < 0 && m > 1)
                {
                    Text(")");
                }

                return;
            }

            if (e == Rational.Half || e == new Rational(-1, 2))
            {
                if (e.Sign < 0)
                {
                    Text(One + " / ");
                }

                Text(_math + "Sqrt(");
                Child(pw.Base, 0);
                Text(")");
                return;
            }

            Text(_math + "Pow(");
            Child(pw.Base, 0);
            Text(", " + CSharpLiterals.Of(e, type) + ")");
        }

        private static bool SmallInteger(Rational e, out int k) =>
            e.TryGetInt32(out k) && k is >= -4 and <= 4;

        private static string FunctionName(Function f) => f switch
        {
            Function.Sin => "Sin",
            Function.Cos => "Cos",
            Function.Tan => "Tan",
            Function.Asin => "Asin",
            Function.Acos => "Acos",
            Function.Atan => "Atan",
            Function.Atan2 => "Atan2",
            Function.Sqrt => "Sqrt",
            Function.Exp => "Exp",
            _ => "Log",
        };
    }
}
