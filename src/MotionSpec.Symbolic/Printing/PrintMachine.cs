using System.Text;

namespace MotionSpec.Symbolic;

/// <summary>
/// An explicit work stack for printers, so that printing expressions thousands of levels deep never
/// recurses. A printer expands one node at a time into literal text and child nodes with the least
/// precedence they may have without parentheses.
/// </summary>
internal abstract class PrintMachine
{
    private readonly Stack<object> _work = new();
    private readonly List<object> _parts = [];

    protected StringBuilder Output { get; } = new();

    public string Run(Expr e)
    {
        if (e is null)
        {
            throw new ArgumentNullException(nameof(e));
        }

        Output.Clear();
        _work.Push(new Item(e, 0));
        while (_work.Count > 0)
        {
            var next = _work.Pop();
            if (next is string text)
            {
                Output.Append(text);
                continue;
            }

            var item = (Item)next;
            _parts.Clear();
            bool wrap = Precedence(item.Node) < item.Context;
            if (wrap)
            {
                _parts.Add(OpenParen);
            }

            Expand(item.Node);
            if (wrap)
            {
                _parts.Add(CloseParen);
            }

            for (int i = _parts.Count - 1; i >= 0; i--)
            {
                _work.Push(_parts[i]);
            }
        }

        return Output.ToString();
    }

    protected virtual string OpenParen => "(";

    protected virtual string CloseParen => ")";

    /// <summary>How tightly the printed node binds (higher binds tighter).</summary>
    protected abstract int Precedence(Expr node);

    /// <summary>Appends the node's parts through Text and Child.</summary>
    protected abstract void Expand(Expr node);

    protected void Text(string text) => _parts.Add(text);

    protected void Child(Expr node, int context) => _parts.Add(new Item(node, context));

    /// <summary>Non-constant terms first, the constant term last, as an engineer writes a sum.</summary>
    protected static IEnumerable<Expr> ReadingOrder(Sum s)
    {
        var terms = s.Children;
        int start = terms[0] is Number ? 1 : 0;
        for (int i = start; i < terms.Length; i++)
        {
            yield return terms[i];
        }

        if (start == 1)
        {
            yield return terms[0];
        }
    }

    /// <summary>A product's parts: sign, coefficient magnitude, factors with positive and with negative exponents (negated).</summary>
    protected static (bool Negative, Rational Magnitude, List<Expr> Numerator, List<Expr> Denominator) SplitFraction(Expr node)
    {
        var numerator = new List<Expr>();
        var denominator = new List<Expr>();
        var coefficient = Rational.One;
        IEnumerable<Expr> factors = node is Product p ? p.Children : [node];
        foreach (var f in factors)
        {
            if (f is Number n)
            {
                coefficient = n.Value;
            }
            else if (f is Power pw && pw.Exponent.Sign < 0)
            {
                denominator.Add(Expr.Pow(pw.Base, -pw.Exponent));
            }
            else
            {
                numerator.Add(f);
            }
        }

        return (coefficient.Sign < 0, coefficient.Abs(), numerator, denominator);
    }

    protected static bool IsNegativeTerm(Expr term) => term switch
    {
        Number n => n.Value.Sign < 0,
        Product p => p.Coefficient.Sign < 0,
        _ => false,
    };

    private sealed record Item(Expr Node, int Context);
}
