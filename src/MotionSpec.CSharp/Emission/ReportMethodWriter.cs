using MotionSpec.Kinematics;
using MotionSpec.Symbolic;
using Sym = MotionSpec.Symbolic.Symbol;

namespace MotionSpec.CSharp.Emission;

/// <summary>
/// Writes the method of one report: all 24 (point) or 15 (frame) components have their common factors
/// pulled out and are then put through common subexpression elimination together, so a sine, a rotation entry or an angular velocity needed by several
/// outputs is computed once, into a local, before the result is assembled.
/// </summary>
internal static class ReportMethodWriter
{
    public static EmittedMethod Write(CodeWriter w, ReportMotion motion, string method, NumericType type,
        IReadOnlyDictionary<Sym, Expr> derivedParams, Func<Sym, string> inputName, Func<string, bool> isTaken, Func<Sym, int> coordRank)
    {
        var number = type == NumericType.Float ? "float" : "double";
        var outputs = new List<Expr>();
        var split = AccelerationFromTerms.Split(motion, isTaken);
        var termLocals = new Dictionary<int, Sym>();
        foreach (var quantity in motion.Quantities)
        {
            var axis = 0;
            foreach (var component in motion[quantity].Components)
            {
                if (split is { } s && quantity == Quantity.Acceleration)
                {
                    outputs.Add(s.Acceleration[axis]);
                }
                else
                {
                    var term = TermIndex(quantity);
                    if (split is { } t && term >= 0)
                    {
                        termLocals[outputs.Count] = t.TermLocals[(3 * term) + axis];
                    }

                    outputs.Add(derivedParams.Count == 0 ? component : Substitution.Apply(component, derivedParams));
                }

                axis++;
            }
        }

        var program = CommonSubexpressions.Eliminate(new GreedyFactoring().Apply(outputs), "k", isTaken);
        string Print(Expr e) => MathNames.Qualify(CSharpPrinter.Print(e, type, inputName));

        var report = motion.Report;
        var isPoint = report.Kind == Language.Binding.ReportKind.Point;
        var summary = isPoint
            ? $"Report {report.Name}: point {report.SubjectName} seen from frame {report.Observer.Name}, the five terms taken with respect to frame {report.Via?.Name ?? report.SubjectFrame.Name}, every vector in the basis of {report.Basis.Name}."
            : $"Report {report.Name}: frame {report.SubjectName} seen from frame {report.Observer.Name}, every vector in the basis of {report.Basis.Name}.";
        w.Summary(Text.CommentText.Xml(summary));
        w.Line("/// <param name=\"t\">Time, s.</param>");
        w.Line("/// <param name=\"s\">The coordinates at time t: values, rates and accelerations in SI units.</param>");
        w.Line("/// <param name=\"p\">The params in SI units (Parameters.Default holds the spec's values).</param>");
        w.Line(isPoint
            ? "/// <returns>Position (m), velocity (m/s), acceleration and its five terms (m/s^2).</returns>"
            : "/// <returns>Angular velocity (rad/s) and acceleration (rad/s^2); origin position (m), velocity (m/s) and acceleration (m/s^2).</returns>");
        var resultType = isPoint ? "PointMotion" : "FrameMotion";
        // Long straight-line methods would otherwise run unoptimised until the runtime's tiering recompiles
        // them, which for a big chain takes many calls: a controller's first cycles would be the slow ones.
        // 512 is MethodImplOptions.AggressiveOptimization, written as a number because netstandard2.0 lacks
        // the name; runtimes without it ignore it.
        w.Line("[global::System.Runtime.CompilerServices.MethodImpl((global::System.Runtime.CompilerServices.MethodImplOptions)512)] // compiled optimised on first call");
        w.Open($"public static {resultType} {method}({number} t, in State s, in Parameters p)");
        var scheduled = TemporarySchedule.ByLink(program.Temporaries, coordRank);
        var pairs = SineCosinePairs.Find(scheduled);
        var written = new HashSet<Sym>();
        foreach (var temporary in scheduled)
        {
            if (!written.Add(temporary.Name))
            {
                continue;
            }

            if (pairs.TryGetValue(temporary.Name, out var pair))
            {
                written.Add(pair.Sine.Name);
                written.Add(pair.Cosine.Name);
                var angle = Print(((Call)pair.Sine.Value).Arguments[0]);
                w.Line($"var ({pair.Sine.Name.Name}, {pair.Cosine.Name.Name}) = global::System.{(type == NumericType.Float ? "MathF" : "Math")}.SinCos({angle});");
                continue;
            }

            w.Line($"{number} {temporary.Name.Name} = {Print(temporary.Value)};");
        }

        foreach (var term in termLocals.OrderBy(p => p.Key))
        {
            w.Line($"{number} {term.Value.Name} = {Print(program.Outputs[term.Key])};");
        }

        string Output(int index) => termLocals.TryGetValue(index, out var local) ? local.Name : Print(program.Outputs[index]);
        w.Line($"return new {resultType}(");
        for (var v = 0; v < program.Outputs.Count / 3; v++)
        {
            var x = Output(3 * v);
            var y = Output((3 * v) + 1);
            var z = Output((3 * v) + 2);
            var end = (3 * v) + 3 == program.Outputs.Count ? ");" : ",";
            w.Line($"    new Vec3({x}, {y}, {z}){end}");
        }

        w.Close();
        return new EmittedMethod(report.Name, method, isPoint, program.Temporaries.Count);
    }

    private static int TermIndex(Quantity quantity)
    {
        for (var i = 0; i < QuantityInfo.Terms.Count; i++)
        {
            if (QuantityInfo.Terms[i] == quantity)
            {
                return i;
            }
        }

        return -1;
    }
}
