using CellCheck.Core.Data;
using CellCheck.Core.Order;

namespace CellCheck.Core.Tests.Order;

/// <summary>
/// The run-order pass behind the blocked Durbin-Watson moments, cut into ranges and merged, against one pass over the
/// whole sequence. Every term is a whole number, so the sums are exact and are compared bit for bit (common practice,
/// no source); the moments themselves are checked against R in DurbinWatsonTests and the large-design tests.
/// </summary>
public sealed class TraceAccumulatorTests
{
    [Theory]
    [InlineData(1)]
    [InlineData(2)]
    [InlineData(3)]
    [InlineData(997)]
    [InlineData(1998)]
    [InlineData(1999)]
    public void Two_ranges_merged_equal_one_pass_bit_for_bit(int cut)
    {
        var (cell, dummy) = Sequence(2000, cells: 23, seed: 5);
        var whole = new TraceAccumulator(23, P);
        whole.Add(cell, dummy, 0, cell.Length);

        var first = new TraceAccumulator(23, P);
        first.Add(cell, dummy, 0, cut);
        var second = new TraceAccumulator(23, P);
        second.Add(cell, dummy, cut, cell.Length);
        first.Merge(second);

        AssertSame(whole, first);
    }

    [Fact]
    public void Three_ranges_merged_in_any_order_equal_one_pass_bit_for_bit()
    {
        var (cell, dummy) = Sequence(3001, cells: 40, seed: 8);
        var whole = new TraceAccumulator(40, P);
        whole.Add(cell, dummy, 0, cell.Length);

        var parts = new[] { (0, 1000), (1000, 1001), (1001, 3001) }.Select(r =>
        {
            var part = new TraceAccumulator(40, P);
            part.Add(cell, dummy, r.Item1, r.Item2);
            return part;
        }).ToArray();
        parts[2].Merge(parts[0]);
        parts[2].Merge(parts[1]);

        AssertSame(whole, parts[2]);
    }

    private const int P = 6; // contrast columns: 4 of the first block factor, 2 of the second

    private static (int[] Cell, LevelCodes[] Dummy) Sequence(int n, int cells, int seed)
    {
        var random = new Random(seed);
        var cell = new int[n];
        var day = new int[n];
        var shift = new int[n];
        for (var t = 0; t < n; t++)
        {
            cell[t] = t % 30 < 6 ? 2 : random.Next(cells); // runs of one cell as well as scattered ones
            day[t] = (t * 5 / n) - 1; // −1 (the first level) then contrast columns 0 .. 3, in stretches
            shift[t] = random.Next(3) == 0 ? -1 : 4 + random.Next(2); // columns 4 and 5, or the first level
        }

        return (cell, [LevelCodes.From(day, P), LevelCodes.From(shift, P)]);
    }

    private static void AssertSame(TraceAccumulator expected, TraceAccumulator actual)
    {
        Assert.Equal(expected.WeightG, actual.WeightG);
        Assert.Equal(expected.WeightW, actual.WeightW);
        Assert.Equal(expected.CrossG, actual.CrossG);
        Assert.Equal(expected.CrossW, actual.CrossW);
        Assert.Equal(expected.Indicator, actual.Indicator);
        Assert.Equal(expected.EeG, actual.EeG);
        Assert.Equal(expected.EeW, actual.EeW);
    }
}
