using System.Globalization;

namespace MotionSpec.Symbolic;

/// <summary>
/// Prints expressions as LaTeX math: Greek letters, dotted marks, \frac for quotients, \sqrt, \sin and
/// friends, thin spaces between factors and \cdot only between two numbers.
/// </summary>
public static class LatexPrinter
{
    /// <summary>The expression as LaTeX (math mode content, no delimiters).</summary>
    public static string Print(Expr e) => new Machine().Run(e);

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
        protected override string OpenParen => @"\left(";

        protected override string CloseParen => @"\right)";

        protected override int Precedence(Expr node) => node switch
        {
            Number n => n.Value.Sign < 0 ? Level.Unary : (n.Value.IsInteger ? Level.Atom : Level.Power),
            Sum => Level.Sum,
            Product p => FractionStartsWithMinus(p) ? Level.Unary : Level.Product,
            Power pw when pw.Exponent.Sign < 0 => Level.Power,
            Power pw when pw.Exponent.Numerator.IsOne => Level.Atom, // roots are delimited by \sqrt{}
            Power => Level.Power,
            _ => Level.Atom,
        };

        protected override void Expand(Expr node)
        {
            switch (node)
            {
                case Number n:
                    Text(NumberText(n.Value));
                    break;
                case PiConstant:
                    Text(@"\pi");
                    break;
                case Symbol s:
                    Text(LatexNames.Of(s));
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
                    PositivePower(pw);
                    break;
                case Power or Product:
                    Fraction(node);
                    break;
                case Call c:
                    CallText(c, null);
                    break;
            }
        }

        private void PositivePower(Power pw)
        {
            var e = pw.Exponent;
            if (e.Numerator.IsOne)
            {
                Text(e.Denominator == 2 ? @"\sqrt{" : @"\sqrt[" + e.Denominator.ToString(CultureInfo.InvariantCulture) + "]{");
                Child(pw.Base, 0);
                Text("}");
                return;
            }

            if (pw.Base is Call c && e.IsInteger && c.Function is Function.Sin or Function.Cos or Function.Tan)
            {
                CallText(c, e.ToString());
                return;
            }

            Child(pw.Base, Level.Atom);
            Text("^{" + (e.IsInteger ? e.ToString() : e.Numerator.ToString(CultureInfo.InvariantCulture) + "/" + e.Denominator.ToString(CultureInfo.InvariantCulture)) + "}");
        }

        private void CallText(Call c, string? power)
        {
            string name = c.Function switch
            {
                Function.Sin => @"\sin",
                Function.Cos => @"\cos",
                Function.Tan => @"\tan",
                Function.Asin => @"\arcsin",
                Function.Acos => @"\arccos",
                Function.Atan => @"\arctan",
                Function.Atan2 => @"\operatorname{atan2}",
                Function.Exp => @"\exp",
                Function.Sqrt => @"\operatorname{sqrt}",
                _ => @"\ln",
            };
            Text(power is null ? name : name + "^{" + power + "}");
            Text(@"\left(");
            for (int i = 0; i < c.Children.Length; i++)
            {
                if (i > 0)
                {
                    Text(", ");
                }

                Child(c.Children[i], 0);
            }

            Text(@"\right)");
        }

        private void Fraction(Expr node)
        {
            var (negative, magnitude, numerator, denominator) = SplitFraction(node);
            if (negative)
            {
                Text("-");
            }

            bool hasDenominator = denominator.Count > 0 || !magnitude.Denominator.IsOne;
            if (hasDenominator)
            {
                Text(@"\frac{");
            }

            Factors(magnitude.Numerator, numerator, hasDenominator);
            if (hasDenominator)
            {
                Text("}{");
                Factors(magnitude.Denominator, denominator, true);
                Text("}");
            }
        }

        private void Factors(System.Numerics.BigInteger number, List<Expr> factors, bool inFraction)
        {
            bool previousIsNumber = false;
            bool first = true;
            if (!number.IsOne || factors.Count == 0)
            {
                Text(number.ToString(CultureInfo.InvariantCulture));
                previousIsNumber = true;
                first = false;
            }

            foreach (var f in factors)
            {
                bool isNumber = f is Number || (f is Power { Base: Number } pw && !pw.Exponent.Numerator.IsOne);
                if (!first)
                {
                    Text(previousIsNumber && isNumber ? @" \cdot " : @"\,");
                }

                // Inside \frac a lone sum needs no parentheses; among several factors it does.
                Child(f, inFraction && factors.Count == 1 && number.IsOne ? 0 : Level.Unary);
                previousIsNumber = isNumber;
                first = false;
            }
        }

        private static bool FractionStartsWithMinus(Product p) => p.Coefficient.Sign < 0;

        private static string NumberText(Rational v)
        {
            if (v.IsInteger)
            {
                return v.ToString();
            }

            string frac = @"\frac{" + BigIntText(v.Abs().Numerator) + "}{" + BigIntText(v.Denominator) + "}";
            return v.Sign < 0 ? "-" + frac : frac;
        }

        private static string BigIntText(System.Numerics.BigInteger b) => b.ToString(CultureInfo.InvariantCulture);
    }
}
