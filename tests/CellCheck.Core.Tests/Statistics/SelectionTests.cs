using CellCheck.Core.Statistics;

namespace CellCheck.Core.Tests.Statistics;

/// <summary>Selection against a full sort (the definition of the k-th smallest value), and the median built on it.</summary>
public sealed class SelectionTests
{
    [Theory]
    [InlineData(100, 1)]
    [InlineData(1001, 2)]
    [InlineData(5000, 3)]
    public void The_kth_smallest_value_equals_the_sorted_value_with_and_without_ties(int n, int seed)
    {
        var random = new Random(seed);
        var values = Enumerable.Range(0, n).Select(_ => Math.Round(random.NextDouble() * 20)).ToArray(); // many ties
        var sorted = values.OrderBy(v => v).ToArray();
        foreach (var k in new[] { 0, 1, n / 3, n / 2, n - 2, n - 1 })
        {
            var copy = (double[])values.Clone();
            Assert.Equal(sorted[k], Selection.Select(copy, k));
            Assert.All(copy[..k], v => Assert.True(v <= sorted[k]));
            Assert.All(copy[(k + 1)..], v => Assert.True(v >= sorted[k]));
        }
    }

    [Theory]
    [InlineData(65)]
    [InlineData(66)]
    [InlineData(10_000)]
    [InlineData(10_001)]
    public void The_median_by_selection_equals_the_median_of_the_sorted_values(int n)
    {
        var random = new Random(n);
        var values = Enumerable.Range(0, n).Select(_ => random.NextDouble()).ToArray();
        var sorted = values.OrderBy(v => v).ToArray();
        var expected = n % 2 == 1 ? sorted[n / 2] : 0.5 * (sorted[(n / 2) - 1] + sorted[n / 2]);
        Assert.Equal(expected, Descriptive.Median(values));
    }
}
