namespace MotionSpec.Symbolic;

/// <summary>Replaces symbols by expressions, rebuilding canonically; shared nodes are rewritten once.</summary>
public static class Substitution
{
    /// <summary>e with every symbol in map replaced by its image (simultaneously, not repeatedly).</summary>
    public static Expr Apply(Expr e, IReadOnlyDictionary<Symbol, Expr> map)
    {
        if (e is null)
        {
            throw new ArgumentNullException(nameof(e));
        }

        if (map is null)
        {
            throw new ArgumentNullException(nameof(map));
        }

        if (map.Count == 0)
        {
            return e;
        }

        var result = Rebuild.BottomUp([e], leaf => leaf is Symbol s && map.TryGetValue(s, out var image) ? image : leaf);
        return result[e];
    }
}
