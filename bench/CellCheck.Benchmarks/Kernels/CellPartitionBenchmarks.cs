using BenchmarkDotNet.Attributes;
using CellCheck.Core.Cells;
using CellCheck.Core.Data;

namespace CellCheck.Benchmarks.Kernels;

/// <summary>
/// Splitting 1 000 000 rows into 10 000 cells (three factors of 25, 20 and 20 levels, each row's cell drawn at random,
/// seeded) by the counting sort of <see cref="CellPartition.Build"/>. Not sealed: BenchmarkDotNet derives its runner
/// from the class.
/// </summary>
[MemoryDiagnoser]
public class CellPartitionBenchmarks
{
    private FactorColumn[] _factors = [];
    private double[] _values = [];

    [GlobalSetup]
    public void Setup()
    {
        const int rows = 1_000_000;
        int[] levels = [25, 20, 20];
        var random = new Random(KernelData.Seed);
        var codes = levels.Select(_ => new int[rows]).ToArray();
        for (var row = 0; row < rows; row++)
        {
            var cell = random.Next(25 * 20 * 20);
            codes[0][row] = cell / 400;
            codes[1][row] = cell / 20 % 20;
            codes[2][row] = cell % 20;
        }

        _factors = levels.Select((count, f) => new FactorColumn("f" + f, Enumerable.Range(0, count).Select(i => "L" + i).ToArray(), codes[f])).ToArray();
        _values = KernelData.Normal(rows);
    }

    [Benchmark]
    public CellPartition Build() => CellPartition.Build(_factors, _values);
}
