using CellCheck.Core.Statistics;

namespace CellCheck.Core.Tests.Statistics;

/// <summary>The radix sort against the comparison sort (the definition of ascending order), with negatives, zeros, ties and a payload.</summary>
public sealed class RadixSortTests
{
    [Fact]
    public void Values_come_out_in_the_order_of_the_comparison_sort_and_the_payload_follows_stably()
    {
        var random = new Random(5);
        var n = RadixSort.Threshold * 3;
        var values = Enumerable.Range(0, n).Select(i => i % 7 == 0 ? Math.Round(random.NextDouble() * 4) - 2 : (random.NextDouble() - 0.5) * Math.Pow(10, random.Next(-5, 6))).ToArray();
        var expected = values.OrderBy(v => v).ToArray();
        var sorted = (double[])values.Clone();
        RadixSort.Sort(sorted);
        Assert.Equal(expected, sorted);

        var keys = (double[])values.Clone();
        var payload = Enumerable.Range(0, n).ToArray();
        RadixSort.Sort(keys, payload);
        Assert.Equal(expected, keys);
        var stable = Enumerable.Range(0, n).OrderBy(i => values[i]).ThenBy(i => i).ToArray();
        Assert.Equal(stable, payload);
        Assert.True(RadixSort.IsAscending(keys));
    }
}
