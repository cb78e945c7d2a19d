using BenchmarkDotNet.Attributes;
using CellCheck.Core.Order;

namespace CellCheck.Benchmarks.Kernels;

/// <summary>The run-order statistics on 1 000 000 seeded residuals. Not sealed: BenchmarkDotNet derives its runner from the class.</summary>
[MemoryDiagnoser]
public class OrderBenchmarks
{
    private double[] _residuals = [];

    [GlobalSetup]
    public void Setup() => _residuals = KernelData.Normal(1_000_000);

    [Benchmark]
    public double DurbinWatsonStatistic() => DurbinWatson.Statistic(_residuals);

    [Benchmark]
    public RunsTestResult RunsTest() => Core.Order.RunsTest.Test(_residuals);
}
