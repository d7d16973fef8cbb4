using MotionSpec.Kinematics;
using MotionSpec.Language.Binding.Symbols;
using MotionSpec.Symbolic;

namespace MotionSpec.Evaluation.ClosedForm;

/// <summary>One report's closed-form vectors compiled into a single plan: three outputs per quantity, in JSON order.</summary>
internal sealed class CompiledReport
{
    public CompiledReport(ReportMotion motion, InputLayout layout)
    {
        Motion = motion;
        var outputs = new List<Expr>(motion.Quantities.Count * 3);
        foreach (var quantity in motion.Quantities)
        {
            outputs.AddRange(motion[quantity].Components);
        }

        Plan = EvaluationPlan.Compile(outputs, layout.Symbols);
    }

    public ReportMotion Motion { get; }

    public ReportSymbol Report => Motion.Report;

    public IReadOnlyList<Quantity> Quantities => Motion.Quantities;

    /// <summary>Number of doubles one sample fills: three per quantity.</summary>
    public int Width => Motion.Quantities.Count * 3;

    public EvaluationPlan Plan { get; }
}
