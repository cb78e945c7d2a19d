using CellCheck.Core.Order;

namespace CellCheck.Core.Tests.Order;

/// <summary>
/// The O(n) moments of d for a group-indicator design against the dense trace computation of
/// <see cref="DurbinWatson"/> on the same design matrix (which is itself checked against R in DurbinWatsonTests).
/// Tolerance 1e-10 relative: both are exact formulas in double precision over a few hundred terms.
/// </summary>
public sealed class GroupedDurbinWatsonTests
{
    [Theory]
    [InlineData(40, 4, 1)]
    [InlineData(120, 12, 2)]
    [InlineData(300, 7, 3)]
    [InlineData(61, 30, 4)]
    public void The_grouped_moments_and_p_equal_the_dense_design_computation(int n, int groups, int seed)
    {
        var random = new Random(seed);
        var group = new int[n];
        for (var t = 0; t < n; t++)
        {
            group[t] = t < groups ? t : random.Next(groups); // every group present
        }

        // runs of one group as well as alternation
        if (seed % 2 == 0)
        {
            Array.Sort(group, 0, n / 3);
        }

        var x = new double[n, groups];
        var residuals = new double[n];
        for (var t = 0; t < n; t++)
        {
            x[t, group[t]] = 1;
            residuals[t] = (random.NextDouble() - 0.5) + (0.01 * t);
        }

        var dense = DurbinWatson.Test(residuals, x, DurbinWatsonAlternative.Positive, exactLimit: 0);
        var grouped = GroupedDurbinWatson.Test(residuals, group, groups);
        Assert.Equal(dense.ExpectedD, grouped.ExpectedD, 1e-10 * dense.ExpectedD);
        Assert.Equal(dense.VarianceD, grouped.VarianceD, 1e-10 * dense.VarianceD);
        Assert.Equal(dense.D, grouped.D);
        Assert.Equal(dense.P, grouped.P, 1e-10 * Math.Max(dense.P, 1e-300));
        Assert.Equal(dense.Method, grouped.Method);
    }

    [Theory]
    [InlineData(1)]
    [InlineData(7)]
    [InlineData(1000)]
    public void Listing_the_steps_between_groups_a_range_at_a_time_gives_the_same_traces_bit_for_bit(int partnerRange)
    {
        // a range smaller than one group's steps (1), a few groups a range (7 to 1000) and everything at once
        var random = new Random(partnerRange);
        var group = Enumerable.Range(0, 20_000).Select(t => t % 50 < 10 ? 3 : random.Next(40)).ToArray();
        group[100] = 39;
        var whole = GroupTraces.Of(group, 41, int.MaxValue);
        var ranged = GroupTraces.Of(group, 41, partnerRange);
        Assert.Equal(BitConverter.DoubleToInt64Bits(whole.TraceMA), BitConverter.DoubleToInt64Bits(ranged.TraceMA));
        Assert.Equal(BitConverter.DoubleToInt64Bits(whole.TraceMA2), BitConverter.DoubleToInt64Bits(ranged.TraceMA2));
        Assert.Equal(whole.Groups, ranged.Groups);
        Assert.Equal(40, whole.Groups); // group 40 is empty
    }
}
