using System.Globalization;
using MotionSpec.Evaluation.Inputs;
using MotionSpec.Kinematics;
using MotionSpec.Language.Diagnostics;
using MotionSpec.Symbolic;

namespace MotionSpec.Evaluation.ClosedForm;

/// <summary>
/// Every param's value in SI: the value set for an independent param, else its definition; derived params are
/// recomputed in file order from the values before them, so an override reaches everything built on it.
/// </summary>
internal static class ParameterResolver
{
    public static double[] Resolve(KinematicModel model, EvaluationInputs inputs, DiagnosticBag diagnostics)
    {
        var values = new double[model.Spec.Parameters.Count];
        var bySymbol = new Dictionary<Symbol, double>();
        foreach (var definition in model.Parameters)
        {
            var param = definition.Param;
            double value;
            if (!param.IsDerived && inputs.ParamOverrides[param.Index] is { } set)
            {
                value = set;
            }
            else
            {
                value = Evaluator.Evaluate(definition.Definition, s => bySymbol.TryGetValue(s, out var v) ? v : double.NaN).Value;
                if (!double.IsFinite(value))
                {
                    diagnostics.Error(
                        EvaluationDiagnosticCodes.ParamNotFinite,
                        param.StatementSpan,
                        string.Create(CultureInfo.InvariantCulture, $"param '{param.Name}' is not finite ({value}) with the values set"));
                }
            }

            values[param.Index] = value;
            bySymbol[definition.Symbol] = value;
        }

        return values;
    }
}
