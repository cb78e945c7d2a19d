using CellCheck.Core.Statistics;

namespace CellCheck.Core.Tests.Statistics;

public sealed class AndersonDarlingSumTests
{
    [Theory]
    [InlineData(65_536)]
    [InlineData(200_001)]
    public void Terms_computed_side_by_side_give_the_same_statistic_bit_for_bit(int n)
    {
        var random = new Random(n);
        var values = new double[n];
        for (var i = 0; i < n; i++)
        {
            values[i] = Math.Exp(random.NextDouble() * 2) - (random.NextDouble() * 3); // skewed, far from normal
        }

        Array.Sort(values);
        var alone = AndersonDarlingSum.Statistic(values.AsSpan());
        var sideBySide = AndersonDarlingSum.Statistic((double[])values.Clone(), n);
        Assert.Equal(BitConverter.DoubleToInt64Bits(alone), BitConverter.DoubleToInt64Bits(sideBySide));
        Assert.Equal(BitConverter.DoubleToInt64Bits(AndersonDarling.Test(values).Statistic),
            BitConverter.DoubleToInt64Bits(AndersonDarling.TestSortedInPlace(values, n).Statistic));
    }
}
