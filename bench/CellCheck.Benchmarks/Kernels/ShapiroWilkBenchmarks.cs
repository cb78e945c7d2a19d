using BenchmarkDotNet.Attributes;
using CellCheck.Core.Statistics;

namespace CellCheck.Benchmarks.Kernels;

/// <summary>
/// Shapiro-Wilk W and p on one seeded normal sample, with the coefficient vector for n already cached (the steady state
/// of a check over many cells of one size). Not sealed: BenchmarkDotNet derives its runner from the class.
/// </summary>
[MemoryDiagnoser]
public class ShapiroWilkBenchmarks
{
    private double[] _sample = [];

    [Params(10, 100, 1000, 5000)]
    public int N { get; set; }

    [GlobalSetup]
    public void Setup()
    {
        _sample = KernelData.Normal(N);
        _ = ShapiroWilk.Test(_sample); // fills the coefficient cache for this n
    }

    [Benchmark]
    public TestOutcome Test() => ShapiroWilk.Test(_sample);
}
