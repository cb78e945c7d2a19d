using CellCheck.Core.Statistics;
using CellCheck.Core.Tests.Support;

namespace CellCheck.Core.Tests.Statistics;

/// <summary>The five spread tests computed together equal each test computed alone, bit for bit, and the separate
/// computations from their own copies: bit for bit, and Fligner-Killeen to its summation's rounding (see Close).</summary>
public sealed class SpreadKernelTests
{
    [Theory]
    [InlineData(1)]
    [InlineData(2)]
    [InlineData(3)]
    [InlineData(4)]
    public void Small_samples_with_ties_singletons_and_zero_spread_cells_give_the_separate_results_bit_for_bit(int seed)
    {
        var random = new Random(seed);
        for (var draw = 0; draw < 60; draw++)
        {
            AllSame(SpreadSamples.Draw(random, groups: random.Next(1, 30), largest: 140, zeroSpread: draw % 3 == 0));
        }
    }

    [Fact]
    public void A_sample_large_enough_for_cells_side_by_side_and_the_radix_sort_gives_the_separate_results_bit_for_bit()
    {
        var random = new Random(20261202);
        AllSame(SpreadSamples.Draw(random, groups: 4000, largest: 200, zeroSpread: false));
    }

    [Fact]
    public void A_large_sample_with_a_zero_spread_cell_gives_the_separate_results_bit_for_bit()
    {
        var random = new Random(7);
        AllSame(SpreadSamples.Draw(random, groups: 1500, largest: 400, zeroSpread: true));
    }

    [Fact]
    public void Every_cell_of_two_gives_the_separate_results()
    {
        AllSame(GroupedValues.FromGroups([[1.0, 2.0], [3.0, 5.0], [7.0, 7.5], [4.0]]));
    }

    [Fact]
    public void A_single_cell_of_two_or_more_gives_the_separate_results()
    {
        AllSame(GroupedValues.FromGroups([[1.0, 2.0, 4.0], [7.0], []]));
    }

    [Fact]
    public void Cells_of_equal_values_are_degenerate_as_each_test_alone_finds_them()
    {
        AllSame(GroupedValues.FromGroups([[1.0, 1.0, 1.0], [4.0, 4.0, 4.0, 4.0], [1e6 + 0.1, 1e6 + 0.1, 1e6 + 0.1]]));
    }

    [Fact]
    public void Values_too_large_to_square_are_rescaled_once_and_give_the_separate_results()
    {
        AllSame(GroupedValues.FromGroups([[1e300, 3e300, 2e300], [5e300, 1e300, 4e300, 4e300], [2e300, 2.5e300]]));
    }

    [Fact]
    public void The_one_way_table_from_group_parts_equals_the_table_from_the_values_bit_for_bit()
    {
        var random = new Random(11);
        for (var draw = 0; draw < 50; draw++)
        {
            var groups = SpreadSamples.Draw(random, groups: random.Next(2, 40), largest: 100, zeroSpread: draw % 2 == 0);
            var expected = SeparateOneWayAnova.Compute(groups);
            var actual = OneWayAnova.Compute(groups);
            Assert.Equal(Bits(expected.SsBetween), Bits(actual.SsBetween));
            Assert.Equal(Bits(expected.SsWithin), Bits(actual.SsWithin));
            Assert.Equal(Bits(expected.F), Bits(actual.F));
            Assert.Equal(Bits(expected.P), Bits(actual.P));
        }
    }

    private static void AllSame(GroupedValues groups)
    {
        var together = SpreadKernel.Run(groups, SpreadTests.All);
        Same(SeparateSpreadTests.AbsoluteDeviationF(groups, median: false), together.Levene!, Levene.Test(groups));
        Same(SeparateSpreadTests.AbsoluteDeviationF(groups, median: true), together.BrownForsythe!, BrownForsythe.Test(groups));
        Same(SeparateSpreadTests.ZerosRemoved(groups), together.BrownForsytheZerosRemoved!, BrownForsytheZerosRemoved.Test(groups));
        Same(SeparateSpreadTests.Bartlett(groups), together.Bartlett!, Bartlett.Test(groups));
        Close(SeparateSpreadTests.FlignerKilleen(groups), together.FlignerKilleen!, FlignerKilleen.Test(groups));
    }

    /// <summary>Fligner-Killeen adds each score to its group's sum in rank order, where the separate computation sums
    /// the stored scores group by group: the same scores, both sums compensated, so X² agrees to a few units in the last
    /// place (1e-13 relative allows for the cancellation in the between-groups sum, about 40× at a thousand values a
    /// group) and p to 1e-9 relative (the chi-square tail's relative change is X²'s times up to X²/2, here below 1e4).
    /// Computed together and alone it is the same code: bit for bit.</summary>
    private static void Close(TestOutcome expected, TestOutcome together, TestOutcome alone)
    {
        Assert.Equal(Bits(alone.Statistic), Bits(together.Statistic));
        Assert.Equal(Bits(alone.P), Bits(together.P));
        Assert.Equal(expected.Reason, together.Reason);
        Assert.Equal(expected.Df1, together.Df1);
        if (expected.Reason is null)
        {
            Assert.Equal(expected.Statistic, together.Statistic, Relative(expected.Statistic, 1e-13));
            Assert.Equal(expected.P, together.P, Relative(expected.P, 1e-9));
        }
    }

    private static double Relative(double value, double tolerance) => Math.Abs(value) * tolerance;

    private static void Same(TestOutcome expected, TestOutcome together, TestOutcome alone)
    {
        foreach (var actual in new[] { together, alone })
        {
            Assert.Equal(expected.Reason, actual.Reason);
            Assert.Equal(Bits(expected.Statistic), Bits(actual.Statistic));
            Assert.Equal(Bits(expected.P), Bits(actual.P));
            Assert.Equal(expected.Df1, actual.Df1);
            Assert.Equal(expected.Df2, actual.Df2);
        }
    }

    private static long Bits(double x) => BitConverter.DoubleToInt64Bits(x);
}
