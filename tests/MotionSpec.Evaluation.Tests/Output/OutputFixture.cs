using MotionSpec.Evaluation.ClosedForm;
using MotionSpec.Evaluation.Sweeps;
using MotionSpec.Evaluation.Tests.Support;

namespace MotionSpec.Evaluation.Tests.Output;

internal static class OutputFixture
{
    public const string Spec = """
        title "Slewing crane"
        param L = 18 m
        param w = 0.6 rpm
        coord s : length
        coord swing : angle
        frame quay
        frame boom in quay {
            rotate about z by w * t
        }
        frame trolley in boom {
            origin at [s, 0, 0]
        }
        frame hook in trolley {
            rotate about x by swing
        }
        point tip in hook at [0, 0, -L / 3]
        report hook in quay
        report tip in quay via trolley
        """;

    public static EvaluationRun Run(params string[] reports) =>
        Specs.Run(Specs.Model(Spec), new TimeSamples(0, 0.5, 3), ["s=4", "s'=0.3", "swing'=0.1"], reports.Length == 0 ? null : reports);
}
