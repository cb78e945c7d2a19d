using CellCheck.Core.Remedies;
using CellCheck.Core.Tests.Statistics;
using CellCheck.Core.Tests.Support;

namespace CellCheck.Core.Tests.Remedies;

/// <summary>
/// Yeo-Johnson against scipy 1.10.1 (yeojohnson, yeojohnson_llf; Fixtures/remedy-check-values.py) for a single
/// sample, and against the profile likelihood written out in R from Yeo &amp; Johnson (2000) for a one-way model
/// (Fixtures/remedy-check-values.R).
/// </summary>
public sealed class YeoJohnsonTests
{
    /// <summary>The statsmodels test sample of the shared reference set (values of both signs).</summary>
    private static readonly double[] Sample =
    [
        -0.1184, -1.3403, 0.0063, -0.612, -0.3869, -0.2313, -2.8485, -0.2167, 0.4153, 1.8492,
        -0.3706, 0.9726, -0.1501, -0.0337, -1.4423, 1.2489, 0.9182, -0.2331, -0.6182, 0.183,
    ];

    [Theory]
    // scipy.stats.yeojohnson_llf(l, x) (Fixtures/remedy-check-values.py); closed form, 1e-12 relative
    [InlineData(-1.0, -24.777465892821553)]
    [InlineData(0.0, -8.585885437787995)]
    [InlineData(0.5, -2.82816237162391)]
    [InlineData(1.0, 0.12651279923363867)]
    [InlineData(2.0, -3.91452532458218)]
    [InlineData(3.0, -16.369748235212256)]
    public void The_single_sample_log_likelihood_matches_scipy(double lambda, double expected) =>
        Close.Relative(expected, YeoJohnson.LogLikelihood(Sample, lambda), 1e-12);

    [Fact]
    public void The_single_sample_estimate_matches_scipy()
    {
        // scipy.stats.yeojohnson(x)[1] = 1.1756199857528316 (Brent's method, tolerance about 1.5e-8 relative);
        // both sides place a flat maximum to about sqrt(machine epsilon): 1e-6
        Close.Absolute(1.1756199857528316, YeoJohnson.Fit(Sample).Lambda, 1e-6);
    }

    [Fact]
    public void The_transform_matches_scipy_on_both_branches()
    {
        // scipy.stats.yeojohnson([-0.5], 2.5) = -0.36700683814454793; yeojohnson([3.0], 0) = log 4 = 1.3862943611198906
        Close.Relative(-0.36700683814454793, YeoJohnson.Transform(-0.5, 2.5), 1e-14);
        Close.Relative(1.3862943611198906, YeoJohnson.Transform(3, 0), 1e-15);
        Assert.Equal(-4.0, YeoJohnson.Transform(-4, 1), 14);
        Assert.Equal(4.0, YeoJohnson.Transform(4, 1), 14);
    }

    [Fact]
    public void The_one_way_model_on_counts_with_zeros_matches_the_written_out_likelihood()
    {
        var data = CsvGroups.Load("insect-sprays.csv", "count", "spray");
        var fit = YeoJohnson.Fit(Indicators(data.Starts), data.Values, "spray");
        // R 4.2.2, Fixtures/remedy-check-values.R: lambda 0.28401045202949521, max log-likelihood -77.009374150792723,
        // interval 0.082729856528598239 to 0.49507842390341383; lambda to 1e-6 (flat maximum), value 1e-10 relative,
        // interval ends 1e-8 (roots of a steep function)
        Close.Absolute(0.28401045202949521, fit.Lambda, 1e-6);
        Close.Relative(-77.009374150792723, fit.LogLikelihood, 1e-10);
        Close.Absolute(0.082729856528598239, fit.CiLower!.Value, 1e-8);
        Close.Absolute(0.49507842390341383, fit.CiUpper!.Value, 1e-8);
    }

    [Fact]
    public void A_large_power_on_large_values_does_not_overflow()
    {
        double[] y = [1e200, 2e200, -5, 3e200, 0];
        var value = YeoJohnson.LogLikelihood(y, 5);
        Assert.True(double.IsFinite(value), $"got {value}");
    }

    /// <summary>One 0/1 column per group (the cell-means design; its span holds the constant).</summary>
    internal static double[,] Indicators(int[] starts)
    {
        var x = new double[starts[^1], starts.Length - 1];
        for (var g = 0; g + 1 < starts.Length; g++)
        {
            for (var i = starts[g]; i < starts[g + 1]; i++)
            {
                x[i, g] = 1;
            }
        }

        return x;
    }
}
