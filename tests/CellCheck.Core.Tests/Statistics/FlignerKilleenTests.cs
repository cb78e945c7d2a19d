using CellCheck.Core.Statistics;
using CellCheck.Core.Tests.Support;

namespace CellCheck.Core.Tests.Statistics;

public sealed class FlignerKilleenTests
{
    // X² is closed form given the normal scores; R's qnorm and MathNet's inverse normal CDF agree to near double
    // precision, so agreement to 1e-12 relative is expected (observed ≤ 1e-14).
    private const double StatisticTolerance = 1e-12;

    // Both sides evaluate the chi-square upper tail to near double precision; 1e-9 leaves room for the statistic's
    // rounding difference amplified by d ln p / d ln X² (observed ≤ 1e-14).
    private const double PTolerance = 1e-9;

    [Theory]
    // R 4.2.2 fligner.test(diameter, batch) (Fixtures/check-values.R); scipy stats.fligner agrees to 1e-15
    [InlineData("gear", 11.150793085594163, 9, 0.26551433945034492)]
    // R 4.2.2 fligner.test(count, spray); R's datasets example prints X² 14.483
    [InlineData("insect-sprays", 14.482781038458608, 5, 0.012816779189709193)]
    // R 4.2.2 fligner.test(weight, group)
    [InlineData("plant-growth", 2.3499371311581996, 2, 0.30882868738638647)]
    // R 4.2.2 fligner.test(time, interaction(poison, treat))
    [InlineData("poisons-time", 30.898714637818351, 11, 0.0011430775671564116)]
    // R 4.2.2 fligner.test(1 / time, interaction(poison, treat))
    [InlineData("poisons-rate", 14.620823468274605, 11, 0.20052206215769741)]
    // R 4.2.2 fligner.test(value, group)
    [InlineData("hollander-wolfe", 5.2091832088217362, 2, 0.073933325076689205)]
    // R 4.2.2 fligner.test(c(1,1,1,1,2,3,2,4,7), rep(1:3, each = 3)): the zero-spread case of the reference README
    [InlineData("zero-spread", 3.4119334096378813, 2, 0.1815967508411413)]
    public void Statistic_degrees_of_freedom_and_p_match_R(string data, double x2, int df, double p)
    {
        var outcome = FlignerKilleen.Test(SpreadData.Load(data));

        Assert.True(outcome.IsTestable);
        Accuracy.AssertRelative(x2, outcome.Statistic, StatisticTolerance, "X²");
        Assert.Equal(df, outcome.Df1);
        Accuracy.AssertRelative(p, outcome.P, PTolerance, "p");
    }

    [Fact]
    public void Groups_of_one_and_empty_groups_take_no_part()
    {
        // our documented choice (R would rank the singleton too): the result equals plant-growth alone,
        // R 4.2.2 fligner.test(weight, group)
        var outcome = FlignerKilleen.Test(SpreadData.WithSingletonAndEmpty(SpreadData.Load("plant-growth"), 5.0));

        Accuracy.AssertRelative(2.3499371311581996, outcome.Statistic, StatisticTolerance);
        Assert.Equal(2, outcome.Df1);
    }

    [Fact]
    public void A_single_group_is_too_few_groups()
    {
        var outcome = FlignerKilleen.Test(GroupedValues.FromGroups([[1.0, 2.0, 4.0], [7.0]]));

        Assert.Equal(NotTestableReason.TooFewGroups, outcome.Reason);
    }

    [Fact]
    public void Equal_scores_everywhere_are_degenerate()
    {
        // every absolute deviation from the group median is 1, so all ranks and scores tie and s²_a = 0
        var outcome = FlignerKilleen.Test(GroupedValues.FromGroups([[0.0, 2.0], [5.0, 7.0], [10.0, 12.0]]));

        Assert.Equal(NotTestableReason.DegenerateWithinGroups, outcome.Reason);
    }
}
