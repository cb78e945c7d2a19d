using BenchmarkDotNet.Attributes;
using CellCheck.Core.Statistics;

namespace CellCheck.Benchmarks.Kernels;

/// <summary>
/// The equal-spread tests on 10 000 seeded groups of 100 values (1 000 000 values laid out group by group, as a cell
/// partition holds them). Not sealed: BenchmarkDotNet derives its runner from the class.
/// </summary>
[MemoryDiagnoser]
public class SpreadTestBenchmarks
{
    private GroupedValues _groups = GroupedValues.FromGroups([]);

    [GlobalSetup]
    public void Setup() => _groups = KernelData.Groups(10_000, 100);

    [Benchmark]
    public TestOutcome Levene() => Core.Statistics.Levene.Test(_groups);

    [Benchmark]
    public TestOutcome BrownForsythe() => Core.Statistics.BrownForsythe.Test(_groups);

    [Benchmark]
    public TestOutcome Bartlett() => Core.Statistics.Bartlett.Test(_groups);

    [Benchmark]
    public TestOutcome FlignerKilleen() => Core.Statistics.FlignerKilleen.Test(_groups);
}
