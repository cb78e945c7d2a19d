using CellCheck.Core.Plots;
using CellCheck.Core.Statistics;

namespace CellCheck.Core.Tests.Plots;

public sealed class RunPlacementTests
{
    /// <summary>The plain way: the rows with a finite position, sorted by position stably (LINQ's OrderBy, equal
    /// positions in row order; from the radix sort's threshold on, the stable radix sort, which puts −0 before 0).</summary>
    private static int[] Sorted(double[] runOrder, int[] rows)
    {
        var placed = rows.Where(r => double.IsFinite(runOrder[r])).ToArray();
        if (placed.Length < RadixSort.Threshold)
        {
            return placed.OrderBy(r => runOrder[r]).ToArray();
        }

        var positions = placed.Select(r => runOrder[r]).ToArray();
        RadixOrder.Sort(positions, placed);
        return placed;
    }

    public static TheoryData<string> Cases => ["consecutive", "gaps", "ties", "fractions", "zeros", "missing", "spread", "negative", "huge"];

    private static double[] Positions(string name, int n, Random random) => name switch
    {
        "consecutive" => Enumerable.Range(1, n).Select(i => (double)i).OrderBy(_ => random.Next()).ToArray(),
        "gaps" => Enumerable.Range(1, n).Select(i => 2.0 * i).OrderBy(_ => random.Next()).ToArray(),
        "ties" => Enumerable.Range(0, n).Select(_ => (double)random.Next(n / 10)).ToArray(),
        "fractions" => Enumerable.Range(0, n).Select(_ => random.Next(n) / 4.0).ToArray(),
        "zeros" => Enumerable.Range(0, n).Select(i => i % 3 == 0 ? -0.0 : random.Next(5)).ToArray(),
        "missing" => Enumerable.Range(0, n).Select(i => i % 7 == 0 ? double.NaN : i % 11 == 0 ? double.PositiveInfinity : random.Next(n)).ToArray(),
        "spread" => Enumerable.Range(0, n).Select(_ => 60.0 * random.Next(n)).ToArray(),
        "negative" => Enumerable.Range(0, n).Select(_ => (double)random.Next(-n, n)).ToArray(),
        _ => Enumerable.Range(0, n).Select(_ => 1e17 + (16.0 * random.Next(n / 8))).ToArray(),
    };

    [Theory]
    [MemberData(nameof(Cases))]
    public void Rows_come_in_run_order_with_shared_positions_in_row_order(string name)
    {
        var random = new Random(20261203);
        foreach (var n in new[] { 1, 2, 50, 5_000, 90_000 }) // below and above the radix sort's threshold
        {
            var runOrder = Positions(name, n, random);
            var rows = Enumerable.Range(0, n).Where(i => i % 5 != 4).OrderBy(_ => random.Next()).ToArray(); // a subset, in any order
            Assert.Equal(Sorted(runOrder, rows), RunPlacement.Placed(runOrder, rows));
        }
    }

    [Fact]
    public void Rows_without_a_finite_position_are_left_out_and_none_left_gives_an_empty_order()
    {
        double[] runOrder = [double.NaN, 3, double.NegativeInfinity, 1, 3];
        Assert.Equal([3, 1, 4], RunPlacement.Placed(runOrder, [0, 1, 2, 3, 4]));
        Assert.Equal([4, 1], RunPlacement.Placed(runOrder, [4, 1]));
        Assert.Empty(RunPlacement.Placed(runOrder, [0, 2]));
    }
}
