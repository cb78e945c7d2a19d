using CellCheck.Core.Calibration;

namespace CellCheck.Core.Tests.Calibration;

public sealed class CalibrationTests
{
    private const double Alpha = 0.05;

    [Theory]
    // a small grid: 12 cells of 3 (Levene alone flags 28% here), 12 cells of 5, 4 cells of 2, an unbalanced 6-cell design
    [InlineData("3,3,3,3,3,3,3,3,3,3,3,3")]
    [InlineData("5,5,5,5,5,5,5,5,5,5,5,5")]
    [InlineData("2,2,2,2")]
    [InlineData("2,3,4,5,6,9")]
    public void Clean_data_are_flagged_at_most_alpha_plus_two_standard_errors(string sizes)
    {
        // Bound of the calibration issue: false-alarm rate <= alpha + 2 binomial standard errors at this draw count
        // (common practice, no source). Seeded: the result is the same on every run.
        var shape = new DesignShape(sizes.Split(',').Select(int.Parse));
        var settings = new CalibrationSettings(NullDraws: 1999, ScenarioDraws: 2000, Seed: 7);
        var fa = Calibrator.Calibrate(shape, Alpha, settings).Operating!.FalseAlarm;
        var bound = Alpha + (2 * Math.Sqrt(Alpha * (1 - Alpha) / fa.Draws));
        Assert.True(fa.Rate <= bound, $"false-alarm rate {fa.Rate} above {bound}");
    }

    [Fact]
    public void A_four_to_one_variance_ratio_is_caught_more_often_than_clean_data_are_flagged()
    {
        var shape = new DesignShape(Enumerable.Repeat(10, 6));
        var o = Calibrator.Calibrate(shape, Alpha, new CalibrationSettings(NullDraws: 499, ScenarioDraws: 300, Seed: 11)).Operating!;
        Assert.True(o.VarianceRatio4.Rate > 3 * o.FalseAlarm.Rate, $"{o.VarianceRatio4.Rate} vs {o.FalseAlarm.Rate}");
    }

    [Fact]
    public void Monte_carlo_p_values_count_the_observed_statistic_among_the_draws()
    {
        // p = (1 + #{T* >= t}) / (B + 1) (Davison & Hinkley 1997, section 4.2.1)
        var nulls = new NullDistribution([1.0, 2, 3, 4]);
        Assert.Equal(1.0, nulls.PValue(0.5));
        Assert.Equal(4.0 / 5, nulls.PValue(2.0));
        Assert.Equal(1.0 / 5, nulls.PValue(9.0));
        Assert.True(double.IsNaN(nulls.PValue(double.NaN)));
    }

    [Fact]
    public void Wilson_intervals_match_r_prop_test_without_continuity_correction()
    {
        // R 4.2.2: prop.test(17, 400, correct = FALSE)$conf.int -> 0.0267016949911311 0.0670020543247502
        var r = new RateEstimate(17, 400);
        Assert.Equal(0.0267016949911311, r.Lower, 1e-12);
        Assert.Equal(0.0670020543247502, r.Upper, 1e-12);
        // R 4.2.2: prop.test(0, 50, correct = FALSE)$conf.int -> 0 0.0713475991333587
        Assert.Equal(0.0, new RateEstimate(0, 50).Lower, 1e-15);
        Assert.Equal(0.0713475991333587, new RateEstimate(0, 50).Upper, 1e-12);
    }

    [Theory]
    [InlineData("2,2,2", NormalityPrimary.ShapiroWilkPooled, SpreadPrimary.Bartlett)]
    [InlineData("2,3,3", NormalityPrimary.ShapiroWilkPooled, SpreadPrimary.BrownForsythe)]
    [InlineData("3,3,3", NormalityPrimary.ShapiroWilkPooled, SpreadPrimary.BrownForsytheZerosRemoved)]
    [InlineData("4,4,4", NormalityPrimary.ShapiroWilkPooled, SpreadPrimary.BrownForsythe)]
    [InlineData("1,2", NormalityPrimary.None, SpreadPrimary.None)]
    [InlineData("3000,3000", NormalityPrimary.AndersonDarlingPooled, SpreadPrimary.BrownForsythe)]
    public void The_primary_checks_follow_the_cell_sizes(string sizes, NormalityPrimary normality, SpreadPrimary spread)
    {
        var choice = PrimaryRules.Choose(new DesignShape(sizes.Split(',').Select(int.Parse)));
        Assert.Equal((normality, spread), (choice.Normality, choice.Spread));
        Assert.False(string.IsNullOrWhiteSpace(choice.NormalityReason));
        Assert.False(string.IsNullOrWhiteSpace(choice.SpreadReason));
    }

    [Fact]
    public void Simulated_draws_do_not_depend_on_scheduling()
    {
        var shape = new DesignShape([4, 4, 5]);
        var choice = PrimaryRules.Choose(shape);
        var a = Calibrator.Simulate(new CellMeansPlan(shape), choice, Departure.Lognormal, 3, 64);
        var b = Calibrator.Simulate(new CellMeansPlan(shape), choice, Departure.Lognormal, 3, 64);
        Assert.Equal(a, b);
    }
}
