namespace MotionSpec.Symbolic;

/// <summary>
/// Common subexpression elimination across several outputs. A node becomes a temporary when it is used more
/// than once, when it is a function call (expensive, and sin/cos of one angle are then computed once), or
/// when it is the compound base of a small integer power (which printers write as repeated products).
/// </summary>
public static class CommonSubexpressions
{
    /// <summary>Eliminates common subexpressions; names are namePrefix + 1, 2, ... skipping taken names.</summary>
    public static CseProgram Eliminate(IReadOnlyList<Expr> outputs, string namePrefix = "k", Func<string, bool>? isTaken = null)
    {
        if (outputs is null)
        {
            throw new ArgumentNullException(nameof(outputs));
        }

        if (string.IsNullOrEmpty(namePrefix))
        {
            throw new ArgumentException("A temporary name prefix is needed.", nameof(namePrefix));
        }

        var order = DagWalk.PostOrder(outputs);
        var uses = new Dictionary<Expr, int>();
        var usedNames = new HashSet<string>(StringComparer.Ordinal);
        foreach (var node in order)
        {
            if (node is Symbol s)
            {
                usedNames.Add(s.Name);
            }

            foreach (var child in node.Children)
            {
                uses[child] = uses.TryGetValue(child, out int u) ? u + 1 : 1;
            }
        }

        foreach (var root in outputs)
        {
            uses[root] = uses.TryGetValue(root, out int u) ? u + 1 : 1;
        }

        var roots = new HashSet<Expr>(outputs);
        var hoist = new HashSet<Expr>();
        foreach (var node in order)
        {
            if (node is Power pw && IsSmallIntegerPower(pw.Exponent) && !IsAtom(pw.Base))
            {
                hoist.Add(pw.Base);
            }
        }

        var temporaries = new List<Temporary>();
        var sharedSums = new SharedSums();
        var replaced = new Dictionary<Expr, Expr>();
        int counter = 0;
        foreach (var node in order)
        {
            Expr rebuilt;
            if (node.Children.Length == 0)
            {
                rebuilt = node;
            }
            else
            {
                var children = new Expr[node.Children.Length];
                for (int i = 0; i < children.Length; i++)
                {
                    children[i] = replaced[node.Children[i]];
                }

                rebuilt = Rebuild.With(node, children);
            }

            var flat = rebuilt;
            rebuilt = sharedSums.Rewrite(rebuilt);

            bool isOutputRoot = roots.Contains(node);

            bool worth = !IsAtom(node) && !IsNegatedAtom(node) && (uses[node] > 1 || node is Call || hoist.Contains(node));
            if (worth && !(isOutputRoot && uses[node] == 1))
            {
                string name;
                do
                {
                    counter++;
                    name = namePrefix + counter.ToString(System.Globalization.CultureInfo.InvariantCulture);
                }
                while (usedNames.Contains(name) || (isTaken?.Invoke(name) ?? false));

                usedNames.Add(name);
                var symbol = Symbol.Intermediate(name);
                temporaries.Add(new Temporary(symbol, rebuilt));
                sharedSums.Register(symbol, flat);
                replaced[node] = symbol;
            }
            else
            {
                replaced[node] = rebuilt;
            }
        }

        var result = new Expr[outputs.Count];
        for (int i = 0; i < result.Length; i++)
        {
            result[i] = replaced[outputs[i]];
        }

        return new CseProgram(temporaries, result);
    }

    internal static bool IsSmallIntegerPower(Rational e) =>
        e.TryGetInt32(out int n) && n is >= -4 and <= 4;

    private static bool IsAtom(Expr e) => e is Symbol or Number or PiConstant;

    private static bool IsNegatedAtom(Expr e) =>
        e is Product p && p.Children.Length == 2 && p.Children[0] is Number && IsAtom(p.Children[1]);
}
