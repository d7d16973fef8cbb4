using MotionSpec.Language.Binding.Symbols;

namespace MotionSpec.Kinematics;

/// <summary>The closed forms of one report: every vector in the report's basis.</summary>
public sealed class ReportMotion
{
    private readonly Dictionary<Quantity, Vector3Expr> _values;

    internal ReportMotion(ReportSymbol report, IReadOnlyList<Quantity> quantities, Dictionary<Quantity, Vector3Expr> values)
    {
        Report = report;
        Quantities = quantities;
        _values = values;
    }

    /// <summary>The report as declared, defaults filled.</summary>
    public ReportSymbol Report { get; }

    /// <summary>The report's name.</summary>
    public string Name => Report.Name;

    /// <summary>The quantities in output order.</summary>
    public IReadOnlyList<Quantity> Quantities { get; }

    /// <summary>One quantity, in <see cref="ReportSymbol.Basis"/>.</summary>
    public Vector3Expr this[Quantity quantity] => _values[quantity];
}
