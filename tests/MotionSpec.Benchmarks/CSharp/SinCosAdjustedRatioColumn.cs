using System.Globalization;
using BenchmarkDotNet.Columns;
using BenchmarkDotNet.Configs;
using BenchmarkDotNet.Reports;
using BenchmarkDotNet.Running;

namespace MotionSpec.Benchmarks.CSharp;

/// <summary>
/// A column on the generated rows: the ratio generated / hand-written with the time of the sine and cosine
/// calls both make taken out of each, (G - T) / (H - T).
/// </summary>
public sealed class ChainColumnsConfig : ManualConfig
{
    public ChainColumnsConfig()
    {
        AddColumn(new SinCosAdjustedRatioColumn());
    }
}

public sealed class SinCosAdjustedRatioColumn : IColumn
{
    public string Id => nameof(SinCosAdjustedRatioColumn);

    public string ColumnName => "Ratio w/o sin+cos";

    public bool AlwaysShow => true;

    public ColumnCategory Category => ColumnCategory.Custom;

    public int PriorityInCategory => 0;

    public bool IsNumeric => true;

    public UnitType UnitType => UnitType.Dimensionless;

    public string Legend => "(generated - sin/cos) / (hand-written - sin/cos), mean times of the same Links";

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
        var (g, h, t) = (Mean(nameof(ChainEvaluatorBenchmarks.Generated)), Mean(nameof(ChainEvaluatorBenchmarks.HandWritten)),
            Mean(nameof(ChainEvaluatorBenchmarks.SinCosOnly)));
        return g is null || h is null || t is null || h <= t ? "?" : ((g - t) / (h - t))!.Value.ToString("0.000", CultureInfo.InvariantCulture);
    }

    public bool IsDefault(Summary summary, BenchmarkCase benchmarkCase) => false;

    public bool IsAvailable(Summary summary) => true;
}
