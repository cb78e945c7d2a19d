using CellCheck.Core.Statistics;

namespace CellCheck.Core.Tests.Statistics;

/// <summary>
/// K², both z's and P are closed-form functions of the sample moments, so check values are matched to 1e-9
/// relative (the reference libraries compute the same formulas in double precision).
/// </summary>
public sealed class DagostinoPearsonTests
{
    private const double Tolerance = 1e-9;

    [Fact]
    public void Dagostino_pearson_matches_the_statsmodels_sample()
    {
        // statsmodels test_omni_normtest, against R fBasics (reference README): K² 3.994138321207883
        // (p 0.1357325110375005), skewness z −1.129304302161460, kurtosis z 1.648881473704978
        var x = ReferenceSamples.Statsmodels20;

        var outcome = DagostinoPearson.Test(x);

        Close.Relative(3.994138321207883, outcome.Statistic, Tolerance);
        Close.Relative(0.1357325110375005, outcome.P, Tolerance);
        Assert.Equal(2.0, outcome.Df1);
        Close.Relative(-1.129304302161460, DagostinoPearson.SkewnessZ(x), Tolerance);
        Close.Relative(1.648881473704978, DagostinoPearson.KurtosisZ(x), Tolerance);
    }

    [Fact]
    public void Dagostino_pearson_matches_the_statsmodels_sample_squared()
    {
        // statsmodels test_omni_normtest (reference README): K² 34.523210399523926, p 3.186985686465249e-08;
        // z's from scipy 1.10 stats.skewtest(x).statistic -> 4.429509162503832,
        // stats.kurtosistest(x).statistic -> 3.8603962204440245
        var x = ReferenceSamples.Statsmodels20.Select(v => v * v).ToArray();

        var outcome = DagostinoPearson.Test(x);

        Close.Relative(34.523210399523926, outcome.Statistic, Tolerance);
        Close.Relative(3.186985686465249e-08, outcome.P, Tolerance);
        Close.Relative(4.429509162503832, DagostinoPearson.SkewnessZ(x), Tolerance);
        Close.Relative(3.8603962204440245, DagostinoPearson.KurtosisZ(x), Tolerance);
    }

    [Fact]
    public void Dagostino_pearson_matches_scipy_on_all_100_gear_diameters()
    {
        // scipy 1.10 stats.normaltest(gear) -> statistic 5.7114308964725335, pvalue 0.05751465763710901;
        // stats.skewtest(gear).statistic -> -0.46369925980626897; stats.kurtosistest(gear).statistic -> 2.3444431946472175
        var x = ReferenceSamples.Gear;

        var outcome = DagostinoPearson.Test(x);

        Close.Relative(5.7114308964725335, outcome.Statistic, Tolerance);
        Close.Relative(0.05751465763710901, outcome.P, Tolerance);
        Close.Relative(-0.46369925980626897, DagostinoPearson.SkewnessZ(x), Tolerance);
        Close.Relative(2.3444431946472175, DagostinoPearson.KurtosisZ(x), Tolerance);
    }

    [Fact]
    public void Dagostino_pearson_matches_scipy_on_a_flat_scrambled_sample()
    {
        // scipy 1.10: i = np.arange(1, 101, dtype=np.int64); x = ((i*7919)%10007)/10007 + ((i*104729)%10009)/10009
        //   + ((i*1299709)%10037)/10037; stats.normaltest(x) -> statistic 2.147870651525251, pvalue 0.3416613197328357;
        //   stats.kurtosistest(x).statistic -> -1.390575577382624 (negative: flatter than normal)
        var x = ReferenceSamples.ScrambledSum(100);

        var outcome = DagostinoPearson.Test(x);

        Close.Relative(2.147870651525251, outcome.Statistic, Tolerance);
        Close.Relative(0.3416613197328357, outcome.P, Tolerance);
        Close.Relative(-1.390575577382624, DagostinoPearson.KurtosisZ(x), Tolerance);
    }

    [Fact]
    public void Dagostino_pearson_matches_scipy_at_the_smallest_valid_size()
    {
        // scipy 1.10 stats.normaltest([1, 2, 3, 4, 5, 6, 8, 9]) -> statistic 0.6206116885308757,
        // pvalue 0.7332226699788046 (scipy warns that its kurtosis test prefers n >= 20)
        var outcome = DagostinoPearson.Test([1.0, 2, 3, 4, 5, 6, 8, 9]);

        Close.Relative(0.6206116885308757, outcome.Statistic, Tolerance);
        Close.Relative(0.7332226699788046, outcome.P, Tolerance);
    }

    [Fact]
    public void Dagostino_pearson_rejects_the_very_flat_gh_9033_sample()
    {
        // scipy gh-9033 (reference README): counts [128, 0, 58, 7, 0, 41, 16, 0, 0, 167] of the values 0..9 must give
        // p < 0.01. Here b2 = 1.2528 lies below the lower end of the Anscombe-Glynn fitted distribution
        // (1 + x√(2/(A − 4)) = −0.2418), so the kurtosis z is −∞ and P = 0. Skewness z from
        // scipy 1.10 stats.skewtest(x).statistic -> -0.09590064802057131.
        int[] counts = [128, 0, 58, 7, 0, 41, 16, 0, 0, 167];
        var x = counts.SelectMany((c, value) => Enumerable.Repeat((double)value, c)).ToArray();

        var outcome = DagostinoPearson.Test(x);

        Assert.True(outcome.P < 0.01);
        Assert.Equal(0.0, outcome.P);
        Assert.Equal(double.NegativeInfinity, DagostinoPearson.KurtosisZ(x));
        Close.Relative(-0.09590064802057131, DagostinoPearson.SkewnessZ(x), Tolerance);
    }

    [Fact]
    public void Dagostino_pearson_needs_eight_values()
    {
        double[] seven = [1.0, 2, 3, 4, 5, 6, 8];

        Assert.Equal(NotTestableReason.TooFewValues, DagostinoPearson.Test(seven).Reason);
        Assert.True(double.IsNaN(DagostinoPearson.SkewnessZ(seven)));
        Assert.True(double.IsNaN(DagostinoPearson.KurtosisZ(seven)));
    }

    [Fact]
    public void Dagostino_pearson_on_identical_values_is_zero_spread()
    {
        var x = Enumerable.Repeat(-3.25, 12).ToArray();

        Assert.Equal(NotTestableReason.ZeroSpread, DagostinoPearson.Test(x).Reason);
        Assert.True(double.IsNaN(DagostinoPearson.SkewnessZ(x)));
    }

    [Fact]
    public void Dagostino_pearson_is_unchanged_by_an_offset_of_a_billion()
    {
        // location invariance: 1e9 + k/64 is exact, so the statistic must equal the un-offset one up to the
        // rounding of the refined mean (1e-9 relative, the closed-form tolerance)
        var y = ReferenceSamples.Statsmodels20.Select(v => Math.Round(v * 64) / 64).ToArray();
        var offset = y.Select(v => v + 1e9).ToArray();

        Close.Relative(DagostinoPearson.Test(y).Statistic, DagostinoPearson.Test(offset).Statistic, Tolerance);
    }
}
