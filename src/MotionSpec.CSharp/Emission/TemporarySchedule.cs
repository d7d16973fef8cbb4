using MotionSpec.Symbolic;
using Sym = MotionSpec.Symbolic.Symbol;

namespace MotionSpec.CSharp.Emission;

/// <summary>
/// Orders the temporaries of a method link by link. Each temporary's level is the number of sine and cosine
/// calls on its longest dependency path, which along a chain is the index of the deepest link it involves; a
/// stable sort by level keeps every temporary after what it uses (a level never falls along a dependency) and
/// groups each link's rotation, rates and origin motion together. Common subexpression order alone computes the
/// sines of every link first and keeps them live to the end, which spills registers on long chains.
/// </summary>
internal static class TemporarySchedule
{
    public static IReadOnlyList<Temporary> ByLink(IReadOnlyList<Temporary> temporaries)
    {
        var levels = new Dictionary<Sym, int>();
        var ordered = new List<(Temporary Temporary, int Level, int Index)>();
        for (var i = 0; i < temporaries.Count; i++)
        {
            var temporary = temporaries[i];
            var level = LevelOf(temporary.Value, levels) + (IsTrig(temporary.Value) ? 1 : 0);
            levels[temporary.Name] = level;
            ordered.Add((temporary, level, i));
        }

        return ordered.OrderBy(t => t.Level).ThenBy(t => t.Index).Select(t => t.Temporary).ToList();
    }

    private static bool IsTrig(Expr e) => e is Call { Function: Function.Sin or Function.Cos };

    // Walks down to the symbols; the earlier temporaries it meets carry their levels.
    private static int LevelOf(Expr e, Dictionary<Sym, int> levels)
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
                    if (levels.TryGetValue(symbol, out var known) && known > level)
                    {
                        level = known;
                    }

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
