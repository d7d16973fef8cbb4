using MotionSpec.Symbolic;
using Sym = MotionSpec.Symbolic.Symbol;

namespace MotionSpec.CSharp.Emission;

/// <summary>
/// Orders the temporaries of a method link by link. A temporary's level is the latest-declared coord it depends
/// on, directly or through other temporaries; along a chain whose coords are declared link by link that is the
/// deepest link it involves. A stable sort by level keeps every temporary after what it uses (a level never falls
/// along a dependency) and groups each link's sines, rotation, rates and origin motion together. Common
/// subexpression order alone follows the first output down the whole chain, computing every link's sines first
/// and keeping them live to the end, which spills registers on long chains.
/// </summary>
internal static class TemporarySchedule
{
    /// <summary>The temporaries in link order; <paramref name="coordRank"/> gives a coord's declaration index.</summary>
    public static IReadOnlyList<Temporary> ByLink(IReadOnlyList<Temporary> temporaries, Func<Sym, int> coordRank)
    {
        var levels = new Dictionary<Sym, int>();
        var ordered = new List<(Temporary Temporary, int Level, int Index)>();
        for (var i = 0; i < temporaries.Count; i++)
        {
            var temporary = temporaries[i];
            var level = LevelOf(temporary.Value, levels, coordRank);
            levels[temporary.Name] = level;
            ordered.Add((temporary, level, i));
        }

        return ordered.OrderBy(t => t.Level).ThenBy(t => t.Index).Select(t => t.Temporary).ToList();
    }

    // Walks down to the symbols; the earlier temporaries it meets carry their levels.
    private static int LevelOf(Expr e, Dictionary<Sym, int> levels, Func<Sym, int> coordRank)
    {
        var level = 0;
        var stack = new Stack<Expr>();
        stack.Push(e);
        while (stack.Count > 0)
        {
            var node = stack.Pop();
            switch (node)
            {
                case Sym symbol:
                    var rank = symbol.Kind == SymbolKind.Coord ? coordRank(symbol) : levels.TryGetValue(symbol, out var known) ? known : 0;
                    level = Math.Max(level, rank);
                    break;
                case Sum sum:
                    foreach (var term in sum.Terms)
                    {
                        stack.Push(term);
                    }

                    break;
                case Product product:
                    foreach (var factor in product.Factors)
                    {
                        stack.Push(factor);
                    }

                    break;
                case Power power:
                    stack.Push(power.Base);
                    break;
                case Call call:
                    foreach (var argument in call.Arguments)
                    {
                        stack.Push(argument);
                    }

                    break;
            }
        }

        return level;
    }
}
