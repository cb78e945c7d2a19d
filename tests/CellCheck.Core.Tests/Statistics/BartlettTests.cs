using CellCheck.Core.Statistics;
using CellCheck.Core.Tests.Support;

namespace CellCheck.Core.Tests.Statistics;

public sealed class BartlettTests
{
    // K² is closed form; R sums the same terms in another order, so agreement to rounding (observed ≤ 1e-14) is expected.
    private const double StatisticTolerance = 1e-12;

    // R's pchisq and MathNet's regularized gamma are both accurate to near double precision; 1e-9 leaves room for the
    // ~1e-14 difference in K² amplified by d ln p / d ln K² (at most ~20 here) (observed ≤ 3e-14).
    private const double PTolerance = 1e-9;

    [Theory]
    // R 4.2.2 bartlett.test(diameter, batch) (Fixtures/check-values.R); scipy TestBartlett gives 20.78587342806484, 0.0136358632781
    [InlineData("gear", 20.785873428064864, 9, 0.013635863278057492)]
    // R 4.2.2 bartlett.test(count, spray); R's datasets example prints K² 25.96
    [InlineData("insect-sprays", 25.959825320368687, 5, 9.0851223329453131e-05)]
    // R 4.2.2 bartlett.test(weight, group)
    [InlineData("plant-growth", 2.8785737872360935, 2, 0.23709677363455817)]
    // R 4.2.2 bartlett.test(time, interaction(poison, treat))
    [InlineData("poisons-time", 45.136885219149875, 11, 4.5904618558008008e-06)]
    // R 4.2.2 bartlett.test(1 / time, interaction(poison, treat))
    [InlineData("poisons-rate", 9.8997480224164303, 11, 0.53942686688668018)]
    // R 4.2.2 bartlett.test(value, group)
    [InlineData("hollander-wolfe", 3.2794144046012046, 2, 0.19403684751681766)]
    public void Statistic_degrees_of_freedom_and_p_match_R(string data, double k2, int df, double p)
    {
        var outcome = Bartlett.Test(SpreadData.Load(data));

        Assert.True(outcome.IsTestable);
        Accuracy.AssertRelative(k2, outcome.Statistic, StatisticTolerance, "K²");
        Assert.Equal(df, outcome.Df1);
        Assert.Null(outcome.Df2);
        Accuracy.AssertRelative(p, outcome.P, PTolerance, "p");
    }

    [Fact]
    public void Gear_statistic_agrees_with_the_handbook_to_its_printed_digits()
    {
        // NIST/SEMATECH e-Handbook 1.3.5.7: T = 20.78580. The handbook's value is 3.5e-6 relative from the
        // full-precision 20.7858734 (R, scipy), so we check agreement to 1e-5 relative, the digits it supports.
        var outcome = Bartlett.Test(SpreadData.Load("gear"));

        Accuracy.AssertRelative(20.78580, outcome.Statistic, 1e-5);
    }

    [Fact]
    public void A_group_with_zero_variance_makes_the_test_not_testable()
    {
        // {1,1,1} has variance 0 and log-variance −∞; the statistic would be infinite (zero-spread case, reference README)
        var outcome = Bartlett.Test(SpreadData.Load("zero-spread"));

        Assert.False(outcome.IsTestable);
        Assert.Equal(NotTestableReason.ZeroVarianceGroup, outcome.Reason);
        Assert.True(double.IsNaN(outcome.Statistic));
    }

    [Fact]
    public void A_single_group_is_too_few_groups()
    {
        var outcome = Bartlett.Test(GroupedValues.FromGroups([[1.0, 2.0, 4.0]]));

        Assert.Equal(NotTestableReason.TooFewGroups, outcome.Reason);
    }

    [Fact]
    public void Groups_of_one_and_empty_groups_take_no_part()
    {
        // same value as plant-growth alone (R 4.2.2 bartlett.test(weight, group)): a singleton has no variance estimate
        var outcome = Bartlett.Test(SpreadData.WithSingletonAndEmpty(SpreadData.Load("plant-growth"), 5.0));

        Accuracy.AssertRelative(2.8785737872360935, outcome.Statistic, StatisticTolerance);
        Assert.Equal(2, outcome.Df1);
    }

    [Fact]
    public void Equal_variances_give_a_statistic_of_zero_and_p_of_one()
    {
        // {0,1,2} and {5,6,7} have variance 1 each: the numerator ν ln s²_p − Σ ν_g ln s²_g is 0 exactly (definition)
        var outcome = Bartlett.Test(GroupedValues.FromGroups([[0.0, 1.0, 2.0], [5.0, 6.0, 7.0]]));

        Assert.Equal(0.0, outcome.Statistic);
        Assert.Equal(1.0, outcome.P);
    }
}
