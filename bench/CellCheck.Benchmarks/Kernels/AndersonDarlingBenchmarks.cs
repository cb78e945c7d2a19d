using BenchmarkDotNet.Attributes;
using CellCheck.Core.Statistics;

namespace CellCheck.Benchmarks.Kernels;

/// <summary>Anderson-Darling A² and p on one seeded normal sample. Not sealed: BenchmarkDotNet derives its runner from the class.</summary>
[MemoryDiagnoser]
public class AndersonDarlingBenchmarks
{
    private double[] _sample = [];

    [Params(10, 1000)]
    public int N { get; set; }

    [GlobalSetup]
    public void Setup() => _sample = KernelData.Normal(N);

    [Benchmark]
    public TestOutcome Test() => AndersonDarling.Test(_sample);
}
