using CellCheck.Core.Statistics;

namespace CellCheck.Core.Tests.Statistics;

public sealed class BartlettKurtosisAdjustedTests
{
    [Fact]
    public void Bartlett_is_divided_by_one_plus_half_the_within_cell_excess_kurtosis()
    {
        // R 4.2.2 on PlantGrowth: k2 <- bartlett.test(weight, group)$statistic (2.878573787236093);
        // g2 <- mean over cells of ((x - mean)^2 / mean((x - mean)^2))^2, minus 3 (-0.688022864559082);
        // k2 / max(0.5, 1 + g2 / 2) = 4.388146270961783, pchisq(., 2, lower.tail = FALSE) = 0.111461823652088.
        // Closed form: 1e-9 relative (observed agreement ~1e-15).
        var outcome = BartlettKurtosisAdjusted.Test(Support.SpreadData.Load("plant-growth"));
        Assert.Equal(4.388146270961783, outcome.Statistic, 1e-9 * 4.4);
        Assert.Equal(0.111461823652088, outcome.P, 1e-9);
        Assert.Equal(2.0, outcome.Df1);
    }

    [Fact]
    public void A_zero_variance_cell_is_not_testable_as_for_bartlett()
    {
        var outcome = BartlettKurtosisAdjusted.Test(GroupedValues.FromGroups([[1.0, 1, 1], [1.0, 2, 3]]));
        Assert.Equal(NotTestableReason.ZeroVarianceGroup, outcome.Reason);
    }
}
