using MotionSpec.Derivation.Geometry;
using MotionSpec.Derivation.Naming;
using MotionSpec.Kinematics;
using MotionSpec.Symbolic;

namespace MotionSpec.Derivation.Sections;

/// <summary>What every section reads: the model, its frame geometry, and the closed forms with their named intermediates.</summary>
internal sealed class DerivationContext
{
    private readonly Dictionary<(int Report, Quantity Quantity), Vector3Expr> _named = [];

    public DerivationContext(KinematicModel model, IReadOnlyList<ReportMotion> reports, string displayName, NamedIntermediates named)
    {
        Model = model;
        Reports = reports;
        DisplayName = displayName;
        Named = named;
        Geometry = new FrameGeometry(model);
        var index = 0;
        for (var r = 0; r < reports.Count; r++)
        {
            foreach (var quantity in reports[r].Quantities)
            {
                _named[(r, quantity)] = new Vector3Expr(named.Outputs[index], named.Outputs[index + 1], named.Outputs[index + 2]);
                index += 3;
            }
        }
    }

    public KinematicModel Model { get; }

    /// <summary>The reports derived (all, or those asked for), in file order; indexes below count in this list.</summary>
    public IReadOnlyList<ReportMotion> Reports { get; }

    public string DisplayName { get; }

    public NamedIntermediates Named { get; }

    public FrameGeometry Geometry { get; }

    /// <summary>A report vector as printed: in terms of the named intermediates.</summary>
    public Vector3Expr Printed(int report, Quantity quantity) => _named[(report, quantity)];

    /// <summary>A report vector as the kinematics stage gave it (no intermediates), for checks.</summary>
    public Vector3Expr Engine(int report, Quantity quantity) => Reports[report][quantity];

    public static IEnumerable<Expr> All(Vector3Expr v) => v.Components;
}
