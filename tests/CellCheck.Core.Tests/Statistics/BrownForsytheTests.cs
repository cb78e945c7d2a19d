using CellCheck.Core.Statistics;
using CellCheck.Core.Tests.Support;

namespace CellCheck.Core.Tests.Statistics;

public sealed class BrownForsytheTests
{
    // F on absolute deviations is closed form; scipy sums in another order, so agreement to rounding (observed
    // ≤ 1e-14) is expected.
    private const double StatisticTolerance = 1e-12;

    // scipy's F survival function is accurate to near double precision, MathNet's incomplete beta to about 1e-13
    // (observed ≤ 3e-13); 1e-9, the project's p-value target, also leaves room for the statistic's rounding
    // difference amplified by d ln p / d ln F.
    private const double PTolerance = 1e-9;

    [Theory]
    // scipy 1.10 stats.levene(*batches, center='median') (Fixtures/check-values.py); scipy TestLevene gives
    // 1.7059176930008939, 0.0990829755522
    [InlineData("gear", 1.7059176930008937, 9, 90, 0.09908297555220462)]
    // scipy 1.10 stats.levene(*sprays, center='median'); R car::leveneTest per the reference README 3.82135631322592
    [InlineData("insect-sprays", 3.8213563132259276, 5, 66, 0.004222791138992105)]
    // scipy 1.10 stats.levene(*groups, center='median')
    [InlineData("plant-growth", 1.1191856948703909, 2, 27, 0.3412266241254737)]
    // scipy 1.10 stats.levene(*cells, center='median'), cells = poison × treatment
    [InlineData("poisons-time", 4.132329643812621, 11, 36, 0.0005833475449517604)]
    // scipy 1.10 stats.levene(*cells, center='median') on 1 / time
    [InlineData("poisons-rate", 1.1272256253124804, 11, 36, 0.36982143682593804)]
    // scipy 1.10 stats.levene(*groups, center='median')
    [InlineData("hollander-wolfe", 4.476854343847557, 2, 11, 0.03780330908861112)]
    // zero-spread case: F = 2.375 exactly (deviations {0,0,0}, {1,0,1}, {2,0,3}: SS between 38/9 on 2 df, within 16/3 on 6 df, by
    // hand); p from scipy 1.10 stats.levene([1,1,1], [1,2,3], [2,4,7], center='median'); reference README 2.375 (0.17387)
    [InlineData("zero-spread", 2.375, 2, 6, 0.17387148301407424)]
    public void Statistic_degrees_of_freedom_and_p_match_scipy(string data, double f, int df1, int df2, double p)
    {
        var outcome = BrownForsythe.Test(SpreadData.Load(data));

        Assert.True(outcome.IsTestable);
        Accuracy.AssertRelative(f, outcome.Statistic, StatisticTolerance, "F");
        Assert.Equal(df1, outcome.Df1);
        Assert.Equal(df2, outcome.Df2);
        Accuracy.AssertRelative(p, outcome.P, PTolerance, "p");
    }

    [Fact]
    public void Gear_statistic_agrees_with_the_handbook_to_its_printed_digits()
    {
        // NIST/SEMATECH e-Handbook 1.3.5.10 (Levene test, median version): W = 1.705910. The handbook's value is
        // 4.5e-6 relative from the full-precision 1.70591769 (scipy, R), so we check agreement to 1e-5 relative.
        var outcome = BrownForsythe.Test(SpreadData.Load("gear"));

        Accuracy.AssertRelative(1.705910, outcome.Statistic, 1e-5);
    }

    [Fact]
    public void Groups_of_one_and_empty_groups_take_no_part()
    {
        // same as plant-growth alone, scipy 1.10 stats.levene(*groups, center='median'); df 2 and 27, not 3 and 27
        var outcome = BrownForsythe.Test(SpreadData.WithSingletonAndEmpty(SpreadData.Load("plant-growth"), 5.0));

        Accuracy.AssertRelative(1.1191856948703909, outcome.Statistic, StatisticTolerance);
        Assert.Equal(2, outcome.Df1);
        Assert.Equal(27, outcome.Df2);
    }

    [Fact]
    public void A_single_group_is_too_few_groups()
    {
        var outcome = BrownForsythe.Test(GroupedValues.FromGroups([[1.0, 2.0, 4.0]]));

        Assert.Equal(NotTestableReason.TooFewGroups, outcome.Reason);
    }

    [Fact]
    public void Groups_of_two_only_are_degenerate()
    {
        // the median of a pair is its midpoint: both deviations are equal, so there is no within-group variation
        var outcome = BrownForsythe.Test(GroupedValues.FromGroups([[0.1, 0.7], [3.0, 3.3], [5.0, 9.0]]));

        Assert.Equal(NotTestableReason.AllGroupsOfTwo, outcome.Reason);
    }

    [Fact]
    public void Constant_groups_everywhere_are_degenerate()
    {
        // all deviations from the medians are 0: the F ratio is 0/0
        var outcome = BrownForsythe.Test(GroupedValues.FromGroups([[1.0, 1.0, 1.0], [4.0, 4.0, 4.0, 4.0]]));

        Assert.Equal(NotTestableReason.DegenerateWithinGroups, outcome.Reason);
    }
}
