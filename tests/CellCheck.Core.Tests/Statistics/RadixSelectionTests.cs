using CellCheck.Core.Statistics;

namespace CellCheck.Core.Tests.Statistics;

/// <summary>Radix selection against a full sort (the definition of the k-th smallest value): signs, ties, zeros,
/// extremes and subnormals, and the median of long samples built on it (common practice, no source).</summary>
public sealed class RadixSelectionTests
{
    public static TheoryData<int, int> Shapes => new() { { 1, 0 }, { 2, 1 }, { 3, 2 }, { 1000, 3 }, { 4097, 4 }, { 100_001, 5 } };

    [Theory]
    [MemberData(nameof(Shapes))]
    public void The_kth_smallest_value_equals_the_sorted_value_for_mixed_signs_ties_and_extremes(int n, int seed)
    {
        var random = new Random(seed);
        double[] specials = [0.0, 1.0, -1.0, double.MaxValue, -double.MaxValue, double.Epsilon, -double.Epsilon, 1e-300, -3.5];
        var values = Enumerable.Range(0, n).Select(i => (i % 7) switch
        {
            0 => specials[random.Next(specials.Length)],
            1 => Math.Round(random.NextDouble() * 10), // ties
            _ => (random.NextDouble() - 0.5) * Math.Pow(10, random.Next(-20, 20)),
        }).ToArray();
        var sorted = values.OrderBy(v => v).ToArray();
        foreach (var k in new[] { 0, 1, n / 3, n / 2, n - 2, n - 1 }.Where(k => k >= 0 && k < n).Distinct())
        {
            var before = (double[])values.Clone();
            Assert.Equal(sorted[k], RadixSelection.Select(values, k));
            var (lower, upper) = RadixSelection.SelectPair(values, k);
            Assert.Equal(sorted[k], upper);
            Assert.Equal(k == 0 ? double.NaN : sorted[k - 1], lower);
            Assert.Equal(before, values); // read only
        }
    }

    [Fact]
    public void Equal_values_give_the_value_itself_at_every_rank()
    {
        var values = Enumerable.Repeat(2.75, 70_000).ToArray();
        Assert.Equal((2.75, 2.75), RadixSelection.SelectPair(values, 35_000));
    }

    [Fact]
    public void A_negative_zero_counts_with_positive_zero_and_comes_back_as_positive_zero()
    {
        double[] values = [-1.0, -0.0, 0.0, -0.0, 2.0];
        var (lower, upper) = RadixSelection.SelectPair(values, 2);
        Assert.Equal(0.0, lower);
        Assert.Equal(0.0, upper);
        Assert.False(double.IsNegative(upper));
        Assert.Equal(2.0, RadixSelection.Select(values, 4));
    }

    [Theory]
    [InlineData(65_536)]
    [InlineData(65_537)]
    [InlineData(200_000)]
    public void The_median_of_a_long_sample_equals_the_median_of_the_sorted_values_without_using_the_scratch(int n)
    {
        var random = new Random(n);
        var values = Enumerable.Range(0, n).Select(_ => Math.Round((random.NextDouble() - 0.4) * 1000, 1)).ToArray();
        var sorted = values.OrderBy(v => v).ToArray();
        var expected = n % 2 == 1 ? sorted[n / 2] : 0.5 * (sorted[(n / 2) - 1] + sorted[n / 2]);
        Assert.Equal(expected, Descriptive.Median(values, []));
        Assert.Equal(expected, Descriptive.Median(values));
    }
}
