using MotionSpec.Language.Text;

namespace MotionSpec.Language.Diagnostics;

/// <summary>Collects diagnostics from every stage; errors are values here, never exceptions.</summary>
public sealed class DiagnosticBag
{
    private readonly List<Diagnostic> _items = [];

    /// <summary>Everything reported so far, in the order reported.</summary>
    public IReadOnlyList<Diagnostic> Items => _items;

    /// <summary>True when at least one error (not only warnings) was reported.</summary>
    public bool HasErrors => _items.Exists(d => d.IsError);

    /// <summary>Adds a finding.</summary>
    public void Add(Diagnostic diagnostic) => _items.Add(diagnostic);

    /// <summary>Adds every finding of another bag.</summary>
    public void AddRange(IEnumerable<Diagnostic> diagnostics) => _items.AddRange(diagnostics);

    /// <summary>Reports an error.</summary>
    public void Error(string code, TextSpan span, string message, string? suggestion = null) =>
        _items.Add(new Diagnostic(code, DiagnosticSeverity.Error, span, message, suggestion));

    /// <summary>Reports a warning.</summary>
    public void Warning(string code, TextSpan span, string message, string? suggestion = null) =>
        _items.Add(new Diagnostic(code, DiagnosticSeverity.Warning, span, message, suggestion));

    /// <summary>The findings sorted by position, then by the order reported (a stable sort).</summary>
    public IReadOnlyList<Diagnostic> Sorted() =>
        _items.Select((d, i) => (d, i)).OrderBy(p => p.d.Span.Start).ThenBy(p => p.i).Select(p => p.d).ToList();
}
