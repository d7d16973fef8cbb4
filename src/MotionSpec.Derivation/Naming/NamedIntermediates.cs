using MotionSpec.Symbolic;

namespace MotionSpec.Derivation.Naming;

/// <summary>
/// Common subexpressions of all closed forms of a derivation, kept only where a name helps a reader: a
/// temporary survives when it stands for a larger expression used more than once; small ones (such as
/// <c>cos(psi)</c>) and those used once are put back, since the expression itself reads better than a name.
/// </summary>
internal sealed class NamedIntermediates
{
    /// <summary>Temporaries whose tree, with earlier temporaries counted as one node, is at most this size are put back.</summary>
    public const int SmallestNamed = 6;

    private NamedIntermediates(IReadOnlyList<Temporary> temporaries, IReadOnlyList<Expr> outputs)
    {
        Temporaries = temporaries;
        Outputs = outputs;
    }

    /// <summary>The kept temporaries, in dependency order.</summary>
    public IReadOnlyList<Temporary> Temporaries { get; }

    /// <summary>The closed forms in terms of inputs and the kept temporaries, in the order given.</summary>
    public IReadOnlyList<Expr> Outputs { get; }

    public static NamedIntermediates Find(IReadOnlyList<Expr> outputs, SpecNames names)
    {
        var simplified = outputs.Select(Geometry.Vector3Algebra.Tidy).ToArray();
        var program = CommonSubexpressions.Eliminate(simplified, "k", names.IsTaken);

        var uses = new Dictionary<Symbol, int>();
        foreach (var root in program.Temporaries.Select(t => t.Value).Concat(program.Outputs))
        {
            CountUses(root, uses, new HashSet<Expr>(ReferenceEqualityComparer.Instance));
        }

        var putBack = new Dictionary<Symbol, Expr>();
        var kept = new List<Temporary>();
        foreach (var temporary in program.Temporaries)
        {
            var value = putBack.Count == 0 ? temporary.Value : Substitution.Apply(temporary.Value, putBack);
            var size = ExprMetrics.TreeNodeCount(value);
            if (size <= SmallestNamed || uses.GetValueOrDefault(temporary.Name) <= 1)
            {
                putBack[temporary.Name] = value;
            }
            else
            {
                kept.Add(new Temporary(temporary.Name, value));
            }
        }

        var finalOutputs = program.Outputs.Select(o => putBack.Count == 0 ? o : Substitution.Apply(o, putBack)).ToArray();
        return Renumber(kept, finalOutputs, names);
    }

    // Names that were put back leave gaps (k1, k4, k9); renumbering gives the reader k1, k2, k3.
    private static NamedIntermediates Renumber(List<Temporary> kept, Expr[] outputs, SpecNames names)
    {
        var renames = new Dictionary<Symbol, Expr>();
        var temporaries = new List<Temporary>();
        var counter = 0;
        foreach (var temporary in kept)
        {
            // New names never run ahead of old ones (both count up in dependency order), and the map below is
            // applied all at once, so an old name reused as a new one cannot be captured.
            string name;
            do
            {
                counter++;
                name = "k" + counter.ToString(System.Globalization.CultureInfo.InvariantCulture);
            }
            while (names.IsTaken(name));

            var symbol = Symbol.Intermediate(name);
            var value = renames.Count == 0 ? temporary.Value : Substitution.Apply(temporary.Value, renames);
            temporaries.Add(new Temporary(symbol, value));
            if (!symbol.Equals(temporary.Name))
            {
                renames[temporary.Name] = symbol;
            }
        }

        var renamed = outputs.Select(o => renames.Count == 0 ? o : Substitution.Apply(o, renames)).ToArray();
        return new NamedIntermediates(temporaries, renamed);
    }

    // Counts every edge into a temporary: a temporary used by two different nodes of one closed form is used
    // twice. (Counting it once per form, as a visited set of nodes would, put back temporaries used many
    // times within one form, and a long chain's forms then grew exponentially when written out.)
    private static void CountUses(Expr e, Dictionary<Symbol, int> uses, HashSet<Expr> seen)
    {
        var stack = new Stack<Expr>();
        stack.Push(e);
        while (stack.Count > 0)
        {
            var node = stack.Pop();
            if (node is Symbol s)
            {
                if (s.Kind == SymbolKind.Intermediate)
                {
                    uses[s] = uses.GetValueOrDefault(s) + 1;
                }

                continue;
            }

            if (!seen.Add(node))
            {
                continue;
            }

            IEnumerable<Expr> children = node switch
            {
                Sum sum => sum.Terms,
                Product product => product.Factors,
                Power power => [power.Base],
                Call call => call.Arguments,
                _ => [],
            };
            foreach (var child in children)
            {
                stack.Push(child);
            }
        }
    }
}
