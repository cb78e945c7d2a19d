using CellCheck.Core.Statistics;

namespace CellCheck.Core.Tests.Statistics;

/// <summary>
/// Check values: R 4.2.2, one-way anova on |y − median| with one zero removed from each odd-sized group:
/// <c>bfz &lt;- function(y, g) { ...; z &lt;- abs(x - median(x)); if (length(x) %% 2 == 1) z &lt;- z[-which(z == 0)[1]]; ... anova(lm(dev ~ grp)) }</c>
/// (Hines &amp; O'Hara Hines 2000). F is closed form: 1e-9 relative; p from the same F tail: 1e-8 relative.
/// </summary>
public sealed class BrownForsytheZerosRemovedTests
{
    [Fact]
    public void Odd_groups_lose_one_zero_deviation_and_match_r()
    {
        // Hollander & Wolfe (1973) p. 116 groups of 5, 4 and 5 (shared reference data): R F = 12 on (2, 9), p 0.00288920636549654
        var outcome = BrownForsytheZerosRemoved.Test(GroupedValues.FromGroups([[2.9, 3.0, 2.5, 2.6, 3.2], [3.8, 2.7, 4.0, 2.4], [2.8, 3.4, 3.7, 2.2, 2.0]]));
        Assert.Equal(12.0, outcome.Statistic, 1e-9 * 12);
        Assert.Equal((2.0, 9.0), (outcome.Df1!.Value, outcome.Df2!.Value));
        Assert.Equal(0.00288920636549654, outcome.P, 1e-8 * 0.0029);
    }

    [Fact]
    public void Mixed_group_sizes_match_r()
    {
        // R 4.2.2 bfz(c(1,2,3,10, 2,4,5, 7,8,9,30,31), rep(c("a","b","c"), c(4,3,5))): F 1.690929965556832 on (2, 7), p 0.251698172219209
        var outcome = BrownForsytheZerosRemoved.Test(GroupedValues.FromGroups([[1.0, 2, 3, 10], [2.0, 4, 5], [7.0, 8, 9, 30, 31]]));
        Assert.Equal(1.690929965556832, outcome.Statistic, 1e-9);
        Assert.Equal(7.0, outcome.Df2);
        Assert.Equal(0.251698172219209, outcome.P, 1e-9);
    }

    [Fact]
    public void Even_groups_give_the_ordinary_brown_forsythe_test()
    {
        // poisons: 12 cells of 4 (even): equals Brown-Forsythe, R 4.2.2 F 4.13232964381262 (shared reference README)
        var groups = Support.SpreadData.Load("poisons-time");
        Assert.Equal(BrownForsythe.Test(groups).Statistic, BrownForsytheZerosRemoved.Test(groups).Statistic, 1e-12);
        Assert.Equal(4.13232964381262, BrownForsytheZerosRemoved.Test(groups).Statistic, 1e-9 * 4.13);
    }

    [Fact]
    public void Groups_of_two_are_degenerate()
    {
        Assert.Equal(NotTestableReason.AllGroupsOfTwo, BrownForsytheZerosRemoved.Test(GroupedValues.FromGroups([[1.0, 2], [3.0, 5]])).Reason);
    }
}
