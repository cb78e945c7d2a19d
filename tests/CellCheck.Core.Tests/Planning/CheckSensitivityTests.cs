using CellCheck.Core.Analysis;
using CellCheck.Core.Calibration;
using CellCheck.Core.Planning;
using CellCheck.Core.Statistics;

namespace CellCheck.Core.Tests.Planning;

public sealed class CheckSensitivityTests
{
    private const double Alpha = 0.05;

    private static CellMeansPlan Plan(int cells, int n) => new(new DesignShape(Enumerable.Repeat(n, cells)));

    /// <summary>The 99.9% binomial interval around alpha for this many draws: alpha ± 3.29 standard errors (normal
    /// approximation to the binomial; at 4000 draws and alpha 0.05, ± 1.1 points).</summary>
    private static void WithinBinomialInterval(RateEstimate? rate, string what)
    {
        Assert.NotNull(rate);
        var half = 3.290527 * Math.Sqrt(Alpha * (1 - Alpha) / rate.Draws);
        Assert.True(Math.Abs(rate.Rate - Alpha) <= half, $"{what}: clean data flagged {rate.Rate:P2}, outside {Alpha:P0} ± {half:P2}");
    }

    [Fact]
    public void Under_the_null_every_check_flags_at_about_alpha_when_its_cells_are_large()
    {
        // 4 cells of 40: every test's asymptotic p-value is accurate here, so the flag rate of clean data (normal errors,
        // equal spread) must fall within the binomial interval around alpha. Seeded: the same on every run.
        var (rates, _) = CheckSensitivity.Rates(Plan(4, 40), Alpha, AdjustMethod.Holm, Departure.None, 4000, 20261301, normality: true, spread: true);
        for (var t = 0; t < rates.Length; t++)
        {
            WithinBinomialInterval(rates[t], SensitivityChecks.All[t].Check + " " + SensitivityChecks.All[t].Scope);
        }
    }

    [Fact]
    public void Under_the_null_the_normality_checks_and_bartlett_flag_at_about_alpha_in_cells_of_ten()
    {
        // 4 cells of 10: the normality tests' p approximations (Royston 1992/1995, Stephens, D'Agostino) and Bartlett's χ²
        // hold at these sizes. The other spread tests do not (next test): that is what the sensitivity table is for.
        var (rates, _) = CheckSensitivity.Rates(Plan(4, 10), Alpha, AdjustMethod.Holm, Departure.None, 4000, 20261302, normality: true, spread: true);
        foreach (var t in new[] { 0, 1, 2, 3, 4, 8 })
        {
            WithinBinomialInterval(rates[t], SensitivityChecks.All[t].Check + " " + SensitivityChecks.All[t].Scope);
        }
    }

    [Fact]
    public void The_table_shows_the_small_sample_behaviour_of_the_deviation_tests()
    {
        // 12 cells of 3: mean-centred Levene is liberal with small cells (Conover, Johnson & Johnson 1981), and
        // median-centred Brown-Forsythe at odd n is conservative (one deviation per cell is zero; Hines & O'Hara Hines 2000).
        var (rates, _) = CheckSensitivity.Rates(Plan(12, 3), Alpha, AdjustMethod.Holm, Departure.None, 1000, 20261303, normality: false, spread: true);
        Assert.True(rates[5]!.Lower > Alpha, $"levene {rates[5]!.Rate}");
        Assert.True(rates[6]!.Upper < Alpha, $"brown-forsythe {rates[6]!.Rate}");
    }

    [Fact]
    public void Simulations_are_seeded_and_reproducible()
    {
        var a = CheckSensitivity.Rates(Plan(5, 6), Alpha, AdjustMethod.Holm, Departure.Lognormal, 300, 9, normality: true, spread: true);
        var b = CheckSensitivity.Rates(Plan(5, 6), Alpha, AdjustMethod.Holm, Departure.Lognormal, 300, 9, normality: true, spread: true);
        Assert.Equal(a.Rates, b.Rates);
        var other = CheckSensitivity.Rates(Plan(5, 6), Alpha, AdjustMethod.Holm, Departure.Lognormal, 300, 10, normality: true, spread: true);
        Assert.NotEqual(a.Rates, other.Rates);
    }

    [Fact]
    public void Departures_are_flagged_more_often_than_clean_data()
    {
        var table = CheckSensitivity.Simulate(Plan(6, 12), Alpha, AdjustMethod.Holm, 400, 31);
        Assert.Equal(SensitivityChecks.All.Count, table.Rows.Count);
        var pooledSw = table.Rows.Single(r => r.Check == CheckNames.ShapiroWilk && r.Scope == SensitivityScopes.Pooled);
        var bartlett = table.Rows.Single(r => r.Check == CheckNames.Bartlett);
        Assert.True(pooledSw.Catches!.Lower > pooledSw.FalseAlarm!.Upper, $"{pooledSw.Catches.Rate} vs {pooledSw.FalseAlarm.Rate}");
        Assert.True(bartlett.Catches!.Lower > bartlett.FalseAlarm!.Upper, $"{bartlett.Catches.Rate} vs {bartlett.FalseAlarm.Rate}");
    }

    [Fact]
    public void Checks_that_cannot_run_at_these_sizes_give_their_reason()
    {
        // cells of 5: Anderson-Darling needs 8 values in a cell
        var table = CheckSensitivity.Simulate(Plan(4, 5), Alpha, AdjustMethod.Holm, 50, 3);
        var ad = table.Rows.Single(r => r.Check == CheckNames.AndersonDarling && r.Scope == SensitivityScopes.WithinCells);
        Assert.Null(ad.Catches);
        Assert.Equal(NotTestableReason.TooFewValues, ad.Reason);
    }
}
