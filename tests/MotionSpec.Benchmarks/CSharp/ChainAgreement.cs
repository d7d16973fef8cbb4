namespace MotionSpec.Benchmarks.CSharp;

/// <summary>Refuses to time two evaluators that disagree (CLI.md's error measure, per vector).</summary>
public static class ChainAgreement
{
    public static double Require(GeneratedChain generated, HandWrittenChain hand, double[] q, double[] qd, double[] qdd,
        double s, double sd, double sdd)
    {
        var a = new double[24];
        var b = new double[24];
        generated.Set(q, qd, qdd, s, sd, sdd);
        generated.Run(a);
        hand.Evaluate(q, qd, qdd, s, sd, sdd, ChainSpec.LinkLength, b);
        var worst = 0.0;
        for (var v = 0; v < 8; v++)
        {
            // Vectors of one dimension share the scale S: position alone, velocity alone, the six accelerations.
            var group = v == 0 ? new[] { 0 } : v == 1 ? new[] { 1 } : new[] { 2, 3, 4, 5, 6, 7 };
            var scale = group.Max(g => Norm(b, g));
            var difference = Math.Sqrt(Enumerable.Range(0, 3).Sum(j => Math.Pow(a[(3 * v) + j] - b[(3 * v) + j], 2)));
            worst = Math.Max(worst, difference / Math.Max(Math.Max(Norm(b, v), scale), 1e-12));
        }

        if (!(worst <= 1e-9))
        {
            throw new InvalidOperationException(
                $"generated and hand-written {hand.Links}-link arms disagree (worst error {worst:G3}); nothing timed");
        }

        return worst;
    }

    private static double Norm(double[] x, int vector) =>
        Math.Sqrt((x[3 * vector] * x[3 * vector]) + (x[(3 * vector) + 1] * x[(3 * vector) + 1]) + (x[(3 * vector) + 2] * x[(3 * vector) + 2]));
}
