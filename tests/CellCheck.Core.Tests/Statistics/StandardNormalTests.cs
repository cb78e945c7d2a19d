using CellCheck.Core.Statistics;

namespace CellCheck.Core.Tests.Statistics;

public sealed class StandardNormalTests
{
    [Theory]
    // scipy 1.10 stats.norm.logcdf(z); 1e-12 relative: scipy evaluates log Φ by its own tail-accurate routine, so
    // both sides are near full precision and 1e-12 leaves room for the asymptotic series' truncation
    [InlineData(-100.0, -5005.524208694205)]
    [InlineData(-40.0, -804.6084420137539)]
    [InlineData(-30.5, -469.4627373229121)] // just inside the asymptotic series
    [InlineData(-29.5, -439.4294746091503)] // just inside the erfc form
    [InlineData(-10.0, -53.23128515051248)]
    [InlineData(-1.0, -1.841021645009264)]
    [InlineData(0.0, -0.6931471805599453)]
    [InlineData(1.0, -0.17275377902344985)]
    [InlineData(5.0, -2.8665161296376305e-07)]
    [InlineData(10.0, -7.619853024160473e-24)]
    public void Log_cdf_matches_scipy_from_deep_lower_tail_to_upper_tail(double z, double expected)
    {
        Close.Relative(expected, StandardNormal.LogCdf(z), 1e-12);
    }

    [Fact]
    public void Log_cdf_is_finite_where_the_cdf_underflows()
    {
        // Φ(−1e5) is far below the smallest double; log Φ ≈ −z²/2 − log|z| − ½ log 2π is finite
        Assert.True(double.IsFinite(StandardNormal.LogCdf(-1e5)));
        Assert.Equal(0.0, StandardNormal.Cdf(-1e5));
    }

    [Fact]
    public void Log_one_plus_is_accurate_for_tiny_arguments()
    {
        // log(1 + x) = x − x²/2 + x³/3 − …: at x = 1e-12 that is 1e-12 − 5e-25 (+3e-37) = 9.999999999995e-13;
        // log(1.0 + x) would lose about 4 digits here since 1.0 + 1e-12 keeps only ~4 significant digits of x
        Close.Relative(9.999999999995e-13, StandardNormal.LogOnePlus(1e-12), 1e-15);
    }

    [Fact]
    public void Both_log_tails_from_one_erfc_equal_two_log_cdf_calls_bit_for_bit()
    {
        // Anderson-Darling relies on this to halve its erfc calls without changing A² (common practice, no source)
        var random = new Random(41);
        var zs = Enumerable.Range(0, 2000).Select(_ => (random.NextDouble() - 0.5) * 80)
            .Concat([0.0, -0.0, 30.0, -30.0, 30.000001, -30.000001, 1e-300, -1e-300, 8.5, -8.5]);
        foreach (var z in zs)
        {
            var (lower, upper) = StandardNormal.LogCdfBoth(z);
            Assert.Equal(StandardNormal.LogCdf(z), lower);
            Assert.Equal(StandardNormal.LogCdf(-z), upper);
        }
    }
}
