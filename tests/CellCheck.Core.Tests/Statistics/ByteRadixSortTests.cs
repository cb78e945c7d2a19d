using CellCheck.Core.Statistics;

namespace CellCheck.Core.Tests.Statistics;

/// <summary>The byte-digit radix sort against the comparison sort (the definition of ascending order), with negatives,
/// ties, zeros of both signs, subnormals and infinities (common practice, no source).</summary>
public sealed class ByteRadixSortTests
{
    [Theory]
    [InlineData(256)]
    [InlineData(1000)]
    [InlineData(4097)]
    [InlineData(65_535)]
    public void Values_come_out_in_ascending_order_with_every_bit_pattern_kept(int n)
    {
        var random = new Random(n);
        double[] special = [0.0, -0.0, double.Epsilon, -double.Epsilon, double.PositiveInfinity, double.NegativeInfinity, double.MaxValue, -double.MaxValue];
        var values = Enumerable.Range(0, n).Select(i => i < special.Length ? special[i]
            : i % 5 == 0 ? Math.Round(random.NextDouble() * 6) - 3 // ties
            : (random.NextDouble() - 0.5) * Math.Pow(10, random.Next(-8, 9))).ToArray();
        random.Shuffle(values);

        var sorted = (double[])values.Clone();
        RadixSort.Sort(sorted);

        var expected = values.OrderBy(v => v).ThenBy(v => double.IsNegative(v) ? 0 : 1).ToArray(); // −0 just before +0
        Assert.Equal(expected.Select(BitConverter.DoubleToInt64Bits), sorted.Select(BitConverter.DoubleToInt64Bits));
    }

    [Fact]
    public void A_sample_holding_nan_is_sorted_as_the_comparison_sort_sorts_it()
    {
        var values = Enumerable.Range(0, 300).Select(i => i == 17 ? double.NaN : 300.0 - i).ToArray();
        var expected = (double[])values.Clone();
        Array.Sort(expected);
        ByteRadixSort.Sort(values);
        Assert.Equal(expected, values);
    }
}
