using CellCheck.Core.Plots;

namespace CellCheck.Core.Tests.Plots;

/// <summary>The two order statistics a simulated QQ envelope takes at each position, found in one pass, against a full
/// sort (the definition of the k-th smallest and k-th largest; common practice, no source). Compared exactly.</summary>
public sealed class EnvelopeTailsTests
{
    [Theory]
    [InlineData(1, 2)]
    [InlineData(5, 199)]
    [InlineData(5, 10)]
    [InlineData(16, 40)]
    [InlineData(3, 999)]
    public void The_kth_smallest_and_largest_are_those_of_the_sorted_values(int k, int length)
    {
        var random = new Random(k * 1000 + length);
        for (var round = 0; round < 50; round++)
        {
            // some rounds with many ties, some with none
            var values = Enumerable.Range(0, length).Select(_ => round % 3 == 0 ? random.Next(4) : random.NextDouble() - 0.5).ToArray();
            var sorted = values.Order().ToArray();
            var (low, high) = QqEnvelopes.Tails(values, k);
            Assert.Equal(sorted[k - 1], low);
            Assert.Equal(sorted[length - k], high);
        }
    }
}
