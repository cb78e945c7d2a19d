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
        RadixOrder.Sort(keys, payload);
        Assert.Equal(expected, keys);
        var stable = Enumerable.Range(0, n).OrderBy(i => values[i]).ThenBy(i => i).ToArray();
        Assert.Equal(stable, payload);
        Assert.True(RadixSort.IsAscending(keys));
    }

    [Theory]
    [InlineData(0)] // long samples of many ties, descending, ascending, and zeros of both signs
    [InlineData(1)]
    [InlineData(2)]
    [InlineData(3)]
    public void Long_samples_of_ties_runs_and_signed_zeros_come_out_in_the_comparison_sort_order(int shape)
    {
        var random = new Random(11 + shape);
        var n = RadixSort.Threshold + 1 + (shape * 1001);
        var values = shape switch
        {
            0 => Enumerable.Range(0, n).Select(_ => Math.Round((random.NextDouble() - 0.5) * 50) / 4).ToArray(), // many ties
            1 => Enumerable.Range(0, n).Select(i => (double)(n - i)).ToArray(), // descending: every first-half value above the second's
            2 => Enumerable.Range(0, n).Select(i => (double)i).ToArray(), // ascending already
            _ => Enumerable.Range(0, n).Select(i => i % 3 == 0 ? -0.0 : i % 3 == 1 ? 0.0 : -random.NextDouble()).ToArray(), // zeros of both signs
        };
        var expected = values.OrderBy(v => v).Select(v => v == 0 ? 0.0 : v).ToArray(); // the sort's rule: −0 reads +0
        var sorted = (double[])values.Clone();
        RadixSort.Sort(sorted);
        Assert.Equal(expected.Select(BitConverter.DoubleToInt64Bits), sorted.Select(BitConverter.DoubleToInt64Bits));
    }

    [Theory]
    [InlineData(1000)]
    [InlineData(200_000)]
    public void Sorted_keys_read_back_the_sorted_values_with_the_index_of_each(int n)
    {
        // both sides of the threshold (comparison sort below it, radix passes above); ties of rounded values included
        var random = new Random(n);
        var values = Enumerable.Range(0, n).Select(_ => Math.Round((random.NextDouble() - 0.5) * 2000) / 8).ToArray();
        var keys = RadixOrder.SortedKeys(values, out var order);
        var sorted = keys.Select(RadixSort.ValueOf).ToArray();
        Assert.Equal(values.OrderBy(v => v).ToArray(), sorted);
        Assert.Equal(sorted, order.Select(i => values[i] == 0 ? 0.0 : values[i]).ToArray());
        Assert.Equal(n, order.Distinct().Count());
    }

    [Theory]
    [InlineData(5_000)]
    [InlineData(300_000)]
    public void Sorted_keys_fold_negative_zero_into_zero_and_keep_every_position(int n)
    {
        var random = new Random(n);
        var values = Enumerable.Range(0, n).Select(i => i % 11 == 0 ? -0.0 : Math.Round((random.NextDouble() - 0.5) * 4000) / 16).ToArray();
        var sorted = RadixOrder.SortedKeys(values, out var order);
        Assert.Equal(values.Select(v => v == 0 ? 0.0 : v).OrderBy(v => v).Select(BitConverter.DoubleToInt64Bits), sorted.Select(k => BitConverter.DoubleToInt64Bits(RadixSort.ValueOf(k))));
        Assert.Equal(sorted.Select(RadixSort.ValueOf).ToArray(), order.Select(i => values[i] == 0 ? 0.0 : values[i]).ToArray());
        Assert.Equal(n, order.Distinct().Count());
    }

    [Fact]
    public void Mid_ranks_may_be_written_over_the_values_they_are_ranked_from()
    {
        // Fligner-Killeen writes its scores over its deviations (common practice, no source)
        var random = new Random(5);
        var values = Enumerable.Range(0, 100_000).Select(_ => Math.Round(random.NextDouble() * 50)).ToArray();
        var separate = new double[values.Length];
        TieAveragedRanks.Compute(values, separate);
        var inPlace = (double[])values.Clone();
        TieAveragedRanks.Compute(inPlace, inPlace);
        Assert.Equal(separate, inPlace);
    }

    [Theory]
    [InlineData(70_001)] // the halves sorted apart and merged (a bucket of crowded values): odd and even lengths
    [InlineData(70_000)]
    public void Keys_sorted_by_halves_merge_into_the_comparison_sort_order(int n)
    {
        var random = new Random(n);
        var keys = Enumerable.Range(0, n).Select(i => i % 3 == 0 ? (ulong)random.Next(100) : (ulong)random.NextInt64()).ToArray();
        var expected = keys.Order().ToArray();
        RadixHalves.Sort(keys);
        Assert.Equal(expected, keys);
    }
}
