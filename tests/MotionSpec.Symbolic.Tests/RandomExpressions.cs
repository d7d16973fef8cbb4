using CsCheck;
using MotionSpec.Symbolic;

namespace MotionSpec.Symbolic.Tests;

/// <summary>
/// Random smooth expressions for property tests, built by a small stack machine driven by random integers
/// (so CsCheck can shrink them). Every operation keeps the expression defined for all real inputs.
/// </summary>
internal static class RandomExpressions
{
    public static readonly Symbol T = Symbol.Time;
    public static readonly Symbol L = Symbol.Param("L");
    public static readonly Symbol Q = Symbol.Coord("q");
    public static readonly Symbol QDot = Symbol.Coord("q", 1);
    public static readonly Symbol QDdot = Symbol.Coord("q", 2);
    public static readonly Symbol S = Symbol.Coord("s");
    public static readonly Symbol SDot = Symbol.Coord("s", 1);
    public static readonly Symbol SDdot = Symbol.Coord("s", 2);

    private static readonly Expr[] Leaves = [T, L, Q, QDot, S];

    public static Gen<Expr> Expression { get; } = Gen.Int[0, 1000].Array[1, 24].Select(Build);

    public static Gen<Expr[]> Expressions(int min, int max) => Gen.Int[0, 1000].Array[1, 12].Select(Build).Array[min, max];

    public static Expr Build(int[] program)
    {
        var stack = new Stack<Expr>();
        foreach (int code in program)
        {
            int op = code % 17;
            int arg = code / 17;
            if (op >= 6 && op <= 10 && stack.Count < 2)
            {
                op = 0;
            }
            else if (op >= 11 && stack.Count < 1)
            {
                op = 0;
            }

            switch (op)
            {
                case <= 4:
                    stack.Push(Leaves[(op + arg) % Leaves.Length]);
                    break;
                case 5:
                    stack.Push(Expr.Number(new Rational((arg % 7) - 3, (arg % 3) + 1)));
                    break;
                case 6:
                    stack.Push(stack.Pop() + stack.Pop());
                    break;
                case 7:
                    {
                        var b = stack.Pop();
                        stack.Push(stack.Pop() - b);
                        break;
                    }

                case 8:
                    stack.Push(stack.Pop() * stack.Pop());
                    break;
                case 9:
                    {
                        var b = stack.Pop();
                        stack.Push(stack.Pop() / (Expr.One + Expr.Pow(b, 2)));
                        break;
                    }

                case 10:
                    {
                        // A product of a sum, so expansion and factoring have work to do.
                        var b = stack.Pop();
                        var a = stack.Pop();
                        stack.Push(a * (b + Leaves[arg % Leaves.Length]));
                        break;
                    }

                case 11:
                    stack.Push(Expr.Sin(stack.Pop()));
                    break;
                case 12:
                    stack.Push(Expr.Cos(stack.Pop()));
                    break;
                case 13:
                    stack.Push(-stack.Pop());
                    break;
                case 14:
                    stack.Push(Expr.Pow(stack.Pop(), (arg % 3) + 2));
                    break;
                case 15:
                    stack.Push(Expr.Sqrt(Expr.One + Expr.Pow(stack.Pop(), 2)));
                    break;
                default:
                    {
                        // sin^2 + cos^2 patterns hidden in scaled terms.
                        var u = stack.Pop();
                        var k = Leaves[arg % Leaves.Length];
                        stack.Push((k * Expr.Pow(Expr.Sin(u), 2)) + (k * Expr.Pow(Expr.Cos(u), 2)) + Expr.Atan(u));
                        break;
                    }
            }
        }

        return Expr.Sum(stack);
    }

    /// <summary>A random state: values for every symbol the generator uses, all in [-1.5, 1.5].</summary>
    public static Gen<double[]> State { get; } = Gen.Double[-1.5, 1.5].Array[9];

    public static Func<Symbol, double> ValueOf(double[] state) => s => s switch
    {
        { Kind: SymbolKind.Time } => state[0],
        { Name: "L" } => state[1],
        { Name: "q", Order: 0 } => state[2],
        { Name: "q", Order: 1 } => state[3],
        { Name: "q", Order: 2 } => state[4],
        { Name: "s", Order: 0 } => state[5],
        { Name: "s", Order: 1 } => state[6],
        { Name: "s", Order: 2 } => state[7],
        _ => state[8],
    };

    public static bool Close(double a, double b, double relative) =>
        Math.Abs(a - b) <= relative * Math.Max(1.0, Math.Max(Math.Abs(a), Math.Abs(b)));
}
