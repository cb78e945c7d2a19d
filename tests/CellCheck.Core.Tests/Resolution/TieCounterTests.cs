using CellCheck.Core.Resolution;

namespace CellCheck.Core.Tests.Resolution;

/// <summary>The tie count is the sample size less its number of distinct values, as a sort and a scan of neighbours
/// count it (common practice, no source); the sort-based count is the reference here.</summary>
public sealed class TieCounterTests
{
    [Fact]
    public void Ties_counted_by_hashing_equal_those_counted_after_a_sort_over_many_samples_with_one_counter()
    {
        var random = new Random(2024);
        var counter = new TieCounter(500);
        for (var sample = 0; sample < 300; sample++)
        {
            var n = random.Next(0, 501);
            var levels = random.Next(1, 60);
            var values = Enumerable.Range(0, n).Select(_ => Math.Round(random.Next(levels) * 0.1 - 2.0, 1)).ToArray();
            Assert.Equal(SortedTies(values), counter.Count(values));
        }
    }

    [Fact]
    public void Zeros_of_both_signs_are_one_value_and_nan_is_never_tied()
    {
        var counter = new TieCounter(8);
        Assert.Equal(1, counter.Count([0.0, -0.0]));
        Assert.Equal(0, counter.Count([double.NaN, double.NaN]));
        Assert.Equal(2, counter.Count([1.5, 2.5, 1.5, 1.5]));
        Assert.Equal(0, counter.Count([]));
    }

    private static int SortedTies(double[] values)
    {
        var sorted = values.ToArray();
        Array.Sort(sorted);
        var tied = 0;
        for (var i = 1; i < sorted.Length; i++)
        {
            tied += sorted[i] == sorted[i - 1] ? 1 : 0;
        }

        return tied;
    }
}
