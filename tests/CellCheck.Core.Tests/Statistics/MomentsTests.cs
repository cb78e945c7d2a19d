using CellCheck.Core.Statistics;

namespace CellCheck.Core.Tests.Statistics;

/// <summary>
/// Check values from scipy 1.10: np.mean(x), np.var(x, ddof=1), np.std(x, ddof=1), stats.skew(x) and
/// stats.kurtosis(x) (bias=True and fisher=True by default: the moment estimators g1 and g2). Closed-form
/// statistics: 1e-9 relative (both sides compute in double precision; differences are summation order only).
/// </summary>
public sealed class MomentsTests
{
    private const double Tolerance = 1e-9;

    [Theory]
    // x = statsmodels 20-value sample (reference README)
    [InlineData("statsmodels", -0.15043, 1.0393983274736842, 1.0195088658141647, -0.5152609735263166, 1.1390986716989238)]
    // x = GEAR diameters (reference README)
    [InlineData("gear", 0.9976400000000001, 3.942464646464642e-05, 0.006278904877814795, -0.10695759026715326, 1.414441567406353)]
    // x = Shapiro & Wilk (1965) weights
    [InlineData("weights", 172.0, 622.6, 24.951953831313492, 1.678543901586165, 1.9912977494355717)]
    // x = [1, 2, 4, 8]
    [InlineData("four", 3.75, 9.583333333333334, 3.095695936834452, 0.6568077344996993, -1.0989792060491494)]
    public void Moments_match_scipy(string sample, double mean, double variance, double sd, double g1, double g2)
    {
        var summary = Moments.Summarize(Sample(sample));

        Close.Relative(mean, summary.Mean, Tolerance);
        Close.Relative(variance, summary.Variance, Tolerance);
        Close.Relative(sd, summary.StandardDeviation, Tolerance);
        Close.Relative(g1, summary.Skewness, Tolerance);
        Close.Relative(g2, summary.ExcessKurtosis, Tolerance);
    }

    [Fact]
    public void Moments_keep_precision_under_an_offset_of_a_billion()
    {
        // scipy 1.10 on y = np.array([37, 12, 55, 21, 48, 30, 9, 64, 26, 41, 18, 33, 50, 27, 70])/64:
        // var(ddof=1) 0.08277994791666665, skew 0.3206536898294296, kurtosis -0.8894642490950249.
        // 1e9 + y is exact and the moments are location invariant apart from the mean.
        double[] y = [37, 12, 55, 21, 48, 30, 9, 64, 26, 41, 18, 33, 50, 27, 70];
        var offset = y.Select(v => 1e9 + (v / 64)).ToArray();

        var summary = Moments.Summarize(offset);

        Close.Relative(1e9 + 0.5635416666666667, summary.Mean, 1e-15); // only the mean's last bit may round
        Close.Relative(0.08277994791666665, summary.Variance, Tolerance);
        Close.Relative(0.3206536898294296, summary.Skewness, Tolerance);
        Close.Relative(-0.8894642490950249, summary.ExcessKurtosis, Tolerance);
    }

    [Fact]
    public void Moments_are_nan_where_the_estimators_are_undefined()
    {
        var one = Moments.Summarize([5.0]);
        Assert.Equal(1, one.Count);
        Assert.Equal(5.0, one.Mean);
        Assert.True(double.IsNaN(one.StandardDeviation));

        var three = Moments.Summarize([1.0, 2, 4]);
        Assert.False(double.IsNaN(three.Skewness));
        Assert.True(double.IsNaN(three.ExcessKurtosis));

        var flat = Moments.Summarize([2.5, 2.5, 2.5, 2.5, 2.5]);
        Assert.Equal(0.0, flat.Variance);
        Assert.True(double.IsNaN(flat.Skewness));
        Assert.True(double.IsNaN(flat.ExcessKurtosis));

        var empty = Moments.Summarize([]);
        Assert.Equal(0, empty.Count);
        Assert.True(double.IsNaN(empty.Mean));
    }

    private static double[] Sample(string name) => name switch
    {
        "statsmodels" => ReferenceSamples.Statsmodels20,
        "gear" => ReferenceSamples.Gear,
        "weights" => ReferenceSamples.ShapiroWilkWeights,
        "four" => [1.0, 2.0, 4.0, 8.0],
        _ => throw new ArgumentOutOfRangeException(nameof(name)),
    };
}
