using System.Globalization;
using BenchmarkDotNet.Columns;
using BenchmarkDotNet.Configs;
using BenchmarkDotNet.Reports;
using BenchmarkDotNet.Running;

namespace MotionSpec.Benchmarks.CSharp;

/// <summary>
/// Two columns on the generated rows: the ratio generated / hand-written with the time of separate sine and
/// cosine calls taken out of both, (G - T) / (H - T); and with each side's own calls taken out, (G - P) / (H - T),
/// P being one Math.SinCos per angle as the generated code makes them. The first is the ratio the issue
/// asks for; the second is the fairer measure of the arithmetic alone.
/// </summary>
public sealed class ChainColumnsConfig : ManualConfig
{
    public ChainColumnsConfig()
    {
        AddColumn(new SinCosAdjustedRatioColumn("Ratio w/o sin+cos", nameof(ChainEvaluatorBenchmarks.SinCosOnly)));
        AddColumn(new SinCosAdjustedRatioColumn("Ratio w/o own trig", nameof(ChainEvaluatorBenchmarks.SinCosPairsOnly)));
    }
}

/// <summary>(generated - its trigonometry) / (hand-written - sin and cos), with the generated side's trigonometry timed by <paramref name="generatedTrig"/>.</summary>
public sealed class SinCosAdjustedRatioColumn(string name, string generatedTrig) : IColumn
{
    public string Id => nameof(SinCosAdjustedRatioColumn) + generatedTrig;

    public string ColumnName => name;

    public bool AlwaysShow => true;

    public ColumnCategory Category => ColumnCategory.Custom;

    public int PriorityInCategory => 0;

    public bool IsNumeric => true;

    public UnitType UnitType => UnitType.Dimensionless;

    public string Legend => $"(generated - {generatedTrig}) / (hand-written - {nameof(ChainEvaluatorBenchmarks.SinCosOnly)}), mean times of the same Links";

    public string GetValue(Summary summary, BenchmarkCase benchmarkCase) => GetValue(summary, benchmarkCase, SummaryStyle.Default);

    public string GetValue(Summary summary, BenchmarkCase benchmarkCase, SummaryStyle style)
    {
        if (benchmarkCase.Descriptor.WorkloadMethod.Name != nameof(ChainEvaluatorBenchmarks.Generated))
        {
            return "-";
        }

        double? Mean(string method) => summary.Reports
            .Where(r => r.BenchmarkCase.Descriptor.WorkloadMethod.Name == method
                && r.BenchmarkCase.Parameters.DisplayInfo == benchmarkCase.Parameters.DisplayInfo)
            .Select(r => r.ResultStatistics?.Mean).FirstOrDefault();
        var (g, h, t, p) = (Mean(nameof(ChainEvaluatorBenchmarks.Generated)), Mean(nameof(ChainEvaluatorBenchmarks.HandWritten)),
            Mean(nameof(ChainEvaluatorBenchmarks.SinCosOnly)), Mean(generatedTrig));
        return g is null || h is null || t is null || p is null || h <= t ? "?" : ((g - p) / (h - t))!.Value.ToString("0.000", CultureInfo.InvariantCulture);
    }

    public bool IsDefault(Summary summary, BenchmarkCase benchmarkCase) => false;

    public bool IsAvailable(Summary summary) => true;
}
