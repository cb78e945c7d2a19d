using CellCheck.Core.Statistics;
using CellCheck.Core.Tests.Support;

namespace CellCheck.Core.Tests.Statistics;

public sealed class LeveneTests
{
    // F on absolute deviations is closed form; scipy sums in another order, so agreement to rounding (observed
    // ≤ 1e-14) is expected.
    private const double StatisticTolerance = 1e-12;

    // scipy's F survival function is accurate to near double precision, MathNet's incomplete beta to about 1e-13
    // (observed ≤ 4e-13); 1e-9, the project's p-value target, also leaves room for the statistic's rounding
    // difference amplified by d ln p / d ln F.
    private const double PTolerance = 1e-9;

    [Theory]
    // scipy 1.10 stats.levene(*batches, center='mean') (Fixtures/check-values.py); R car::leveneTest(center = mean)
    // per the reference README, 2.15945985647285 (0.032236826559783)
    [InlineData("gear", 2.1594598564728518, 9, 90, 0.032236826559783265)]
    // scipy 1.10 stats.levene(*sprays, center='mean')
    [InlineData("insect-sprays", 6.455352710086696, 5, 66, 6.103633834482072e-05)]
    // scipy 1.10 stats.levene(*groups, center='mean')
    [InlineData("plant-growth", 1.2369629544697844, 2, 27, 0.30619492299144685)]
    // scipy 1.10 stats.levene(*cells, center='mean'), cells = poison × treatment
    [InlineData("poisons-time", 4.85353656448022, 11, 36, 0.00014424343052068096)]
    // scipy 1.10 stats.levene(*cells, center='mean') on 1 / time
    [InlineData("poisons-rate", 1.5762714857914735, 11, 36, 0.14805502210301816)]
    // scipy 1.10 stats.levene(*groups, center='mean')
    [InlineData("hollander-wolfe", 4.781469208069268, 2, 11, 0.032039911416238256)]
    // scipy 1.10 stats.levene([1,1,1], [1,2,3], [2,4,7], center='mean')
    [InlineData("zero-spread", 3.7692307692307674, 2, 6, 0.08704539584898578)]
    public void Statistic_degrees_of_freedom_and_p_match_scipy(string data, double f, int df1, int df2, double p)
    {
        var outcome = Levene.Test(SpreadData.Load(data));

        Assert.True(outcome.IsTestable);
        Accuracy.AssertRelative(f, outcome.Statistic, StatisticTolerance, "F");
        Assert.Equal(df1, outcome.Df1);
        Assert.Equal(df2, outcome.Df2);
        Accuracy.AssertRelative(p, outcome.P, PTolerance, "p");
    }

    [Fact]
    public void Groups_of_one_and_empty_groups_take_no_part()
    {
        // same as plant-growth alone, scipy 1.10 stats.levene(*groups, center='mean'); df 2 and 27, not 3 and 27
        var outcome = Levene.Test(SpreadData.WithSingletonAndEmpty(SpreadData.Load("plant-growth"), 5.0));

        Accuracy.AssertRelative(1.2369629544697844, outcome.Statistic, StatisticTolerance);
        Assert.Equal(2, outcome.Df1);
        Assert.Equal(27, outcome.Df2);
    }

    [Fact]
    public void A_single_group_is_too_few_groups()
    {
        var outcome = Levene.Test(GroupedValues.FromGroups([[1.0, 2.0, 4.0], [7.0], []]));

        Assert.Equal(NotTestableReason.TooFewGroups, outcome.Reason);
    }

    [Fact]
    public void Groups_of_two_only_are_degenerate()
    {
        // both values of a pair lie equally far from its mean, so the deviations do not vary within groups
        var outcome = Levene.Test(GroupedValues.FromGroups([[0.1, 0.7], [3.0, 3.3], [5.0, 9.0], [2.0]]));

        Assert.Equal(NotTestableReason.AllGroupsOfTwo, outcome.Reason);
    }

    [Fact]
    public void Deviations_equal_within_every_group_are_degenerate()
    {
        // {0.1, 0.1, 0.7, 0.7}: every deviation from the mean 0.4 is 0.3 in exact arithmetic, so the within-group
        // variation is zero; rounding of 0.1 and 0.7 must not turn it into a huge F
        var outcome = Levene.Test(GroupedValues.FromGroups([[0.1, 0.1, 0.7, 0.7], [3.0, 3.0, 3.0], [1.3, 2.9]]));

        Assert.Equal(NotTestableReason.DegenerateWithinGroups, outcome.Reason);
    }
}
