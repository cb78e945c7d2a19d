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

    // Reference values. R's fligner.test and scipy's stats.fligner rank the absolute deviations by exact binary
    // equality, so deviations that are equal in decimal (ties) but differ by rounding noise get distinct ranks; we
    // rank them as ties (see FlignerKilleen remarks). On integer data (InsectSprays, the zero-spread case) there is no
    // noise and R's values hold to full precision. On decimal data the check values are the same statistic with ties
    // decided in exact rational arithmetic: /usr/bin/python3 with fractions.Fraction for the deviations and
    // scipy 1.10 stats.norm.ppf for the scores, script Fixtures/fligner-exact-ties.py. R's own values for those
    // data are kept beside them to show the size of the rounding-noise effect.
    [Theory]
    // exact ties (fligner-exact-ties.py); R 4.2.2 fligner.test(diameter, batch) gives 11.150793085594163 by noise
    [InlineData("gear", 11.146469450974557, 9, 0.2658027098407764)]
    // R 4.2.2 fligner.test(count, spray); R's datasets example prints X² 14.483 (integers: no rounding noise)
    [InlineData("insect-sprays", 14.482781038458608, 5, 0.012816779189709193)]
    // exact ties; R 4.2.2 fligner.test(weight, group) gives 2.3499371311581996
    [InlineData("plant-growth", 2.3504555524813675, 2, 0.30874864607224206)]
    // exact ties; R 4.2.2 fligner.test(time, interaction(poison, treat)) gives 30.898714637818351
    [InlineData("poisons-time", 31.05196813358158, 11, 0.0010808041543472772)]
    // exact ties; R 4.2.2 fligner.test(1 / time, interaction(poison, treat)) gives 14.620823468274605
    [InlineData("poisons-rate", 14.622766818243155, 11, 0.20042624353359473)]
    // exact ties; R 4.2.2 fligner.test(value, group) gives 5.2091832088217362
    [InlineData("hollander-wolfe", 5.223344723047877, 2, 0.07341167019453919)]
    // R 4.2.2 fligner.test(c(1,1,1,1,2,3,2,4,7), rep(1:3, each = 3)): the zero-spread case of the reference README
    [InlineData("zero-spread", 3.4119334096378813, 2, 0.1815967508411413)]
    public void Statistic_degrees_of_freedom_and_p_match_R_with_ties_kept_exact(string data, double x2, int df, double p)
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
        // exact-tie value from Fixtures/fligner-exact-ties.py (see above)
        var outcome = FlignerKilleen.Test(SpreadData.WithSingletonAndEmpty(SpreadData.Load("plant-growth"), 5.0));

        Accuracy.AssertRelative(2.3504555524813675, outcome.Statistic, StatisticTolerance);
        Assert.Equal(2, outcome.Df1);
    }

    [Fact]
    public void Deviations_equal_in_decimal_are_ranked_as_ties_whatever_their_binary_rounding()
    {
        // 0.998 and 1.002 lie 0.002 from the median 1.000 in exact arithmetic; in binary the two deviations differ
        // by about 1e-16. Shifting every value by a constant must not change X² (common practice, no source).
        var a = FlignerKilleen.Test(GroupedValues.FromGroups([[0.998, 1.000, 1.002], [0.990, 1.000, 1.010], [1.001, 1.000, 0.999]]));
        var b = FlignerKilleen.Test(GroupedValues.FromGroups([[-0.002, 0.0, 0.002], [-0.010, 0.0, 0.010], [0.001, 0.0, -0.001]]));
        Assert.Equal(a.Statistic, b.Statistic, 1e-12);
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
