using MotionSpec.Language.Binding.Symbols;

namespace MotionSpec.Language.Binding;

/// <summary>
/// The one namespace of a spec, filled in declaration order. While a frame's block is bound, that frame's
/// name is known here as "under construction" but is not yet in scope.
/// </summary>
internal sealed class Scope
{
    private readonly Dictionary<string, Symbol> _byName = new(StringComparer.Ordinal);
    private readonly List<Symbol> _inOrder = [];
    private readonly HashSet<string> _broken = new(StringComparer.Ordinal);

    /// <summary>The frame whose block is being bound, if any.</summary>
    public FrameSymbol? FrameUnderConstruction { get; set; }

    /// <summary>Every declared symbol in declaration order.</summary>
    public IReadOnlyList<Symbol> InOrder => _inOrder;

    /// <summary>The symbol of that name, or null.</summary>
    public Symbol? Find(string name) => _byName.TryGetValue(name, out var symbol) ? symbol : null;

    /// <summary>Adds a symbol whose name is known to be free.</summary>
    public void Add(Symbol symbol)
    {
        _byName.Add(symbol.Name, symbol);
        _inOrder.Add(symbol);
    }

    /// <summary>Marks a name whose declaration failed to parse: it is already reported.</summary>
    public void AddBroken(string name) => _broken.Add(name);

    /// <summary>True when the name's declaration failed to parse (and no valid declaration exists).</summary>
    public bool IsBroken(string name) => _broken.Contains(name) && !_byName.ContainsKey(name);

    /// <summary>True when the name is the frame whose block is being bound.</summary>
    public bool IsFrameUnderConstruction(string name) =>
        FrameUnderConstruction is { } frame && string.Equals(frame.Name, name, StringComparison.Ordinal);
}
