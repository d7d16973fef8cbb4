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
        var simplified = outputs.Select(Simplifier.Simplify).ToArray();
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

    private static void CountUses(Expr e, Dictionary<Symbol, int> uses, HashSet<Expr> seen)
    {
        if (!seen.Add(e))
        {
            return;
        }

        switch (e)
        {
            case Symbol s when s.Kind == SymbolKind.Intermediate:
                uses[s] = uses.GetValueOrDefault(s) + 1;
                break;
            case Sum sum:
                foreach (var term in sum.Terms)
                {
                    CountUses(term, uses, seen);
                }

                break;
            case Product product:
                foreach (var factor in product.Factors)
                {
                    CountUses(factor, uses, seen);
                }

                break;
            case Power power:
                CountUses(power.Base, uses, seen);
                break;
            case Call call:
                foreach (var argument in call.Arguments)
                {
                    CountUses(argument, uses, seen);
                }

                break;
        }
    }
}
