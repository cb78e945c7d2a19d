using CellCheck.Core.Planning;
using CellCheck.Core.Tests.Statistics;

namespace CellCheck.Core.Tests.Planning;

public sealed class NoncentralFTests
{
    // R 4.2.2 power at the 5% critical value: pf(qf(.95, a, b), a, b, ncp, lower = FALSE) (shared reference, "Power
    // (noncentral F)"). Tolerance 1e-9 absolute: R's pnbeta (AS 226) stops its series at errmax 1e-9 and forms the upper
    // tail as 1 − CDF, so these values themselves are good to about 1e-9 (the series below shows R is 4e-10 high at (2, 27, 10)).
    [Theory]
    [InlineData(2, 27, 10, 0.767353621723)]
    [InlineData(5, 66, 20, 0.932760968962)]
    [InlineData(4, 20, 50, 0.999766833995)]
    [InlineData(1, 10, 0, 0.05)]
    public void Power_at_the_five_percent_critical_value_matches_the_reference_points(double df1, double df2, double lambda, double expected)
    {
        var power = NoncentralF.UpperTail(FCritical.Upper(0.05, df1, df2), df1, df2, lambda);
        Close.Absolute(expected, power, 1e-9);
    }

    // The Poisson-weighted beta series summed in R 4.2.2 with R's central pbeta (TOMS 708, accurate to about 1e-15):
    // up <- function(f, a, b, l, J = 20000) { y <- b/(b + a*f); j <- 0:J; sum(dpois(j, l/2) * pbeta(y, b/2, a/2 + j)) }
    // and up(qf(.95, a, b), a, b, l). scipy 1.10.1 stats.ncf.sf agrees where quoted. Tolerance 1e-12 relative: the two
    // sums use different incomplete beta codes, each good to about 1e-14, over up to a few hundred terms.
    [Theory]
    [InlineData(2, 27, 10, 0.767353621333334)]
    [InlineData(5, 66, 20, 0.93276096879244)]
    [InlineData(4, 20, 50, 0.999766833792214)]
    [InlineData(3, 16, 5, 0.353559423722994)]
    [InlineData(3, 76, 6.272, 0.514979291963695)]
    public void Power_matches_the_beta_series_summed_in_r(double df1, double df2, double lambda, double expected)
    {
        var power = NoncentralF.UpperTail(FCritical.Upper(0.05, df1, df2), df1, df2, lambda);
        Close.Relative(expected, power, 1e-12);
    }

    // Far upper tails, same R series command: up(50, 3, 20, 2) and up(200, 3, 20, 2); scipy 1.10.1
    // stats.ncf.sf(50, 3, 20, 2) = 4.1190934445657015e-08 and stats.ncf.sf(200, 3, 20, 2) = 1.341348090550949e-13.
    // R's own pf(200, 3, 20, 2, lower = FALSE) gives 8.3e-10, which is what a 1 − CDF upper tail loses. Tolerance 1e-11
    // relative: the tail terms are incomplete betas far from their mean, where each code keeps about 12 digits.
    [Theory]
    [InlineData(50, 3, 20, 2, 4.1190934445657e-08)]
    [InlineData(200, 3, 20, 2, 1.34134809055095e-13)]
    [InlineData(2.5, 7.5, 33.3, 17.25, 0.709145673186417)]
    [InlineData(341, 3, 100, 1000, 0.463261409069013)]
    public void Upper_tails_keep_their_relative_precision(double f, double df1, double df2, double lambda, double expected)
    {
        Close.Relative(expected, NoncentralF.UpperTail(f, df1, df2, lambda), 1e-11);
    }

    // Lower tails by the same series with pbeta(x, a/2 + j, b/2), x = a f / (b + a f), in R 4.2.2:
    // lo(1, 3, 20, 2), lo(0.01, 3, 20, 5), lo(0.001, 4, 12, 30), lo(2.5, 7.5, 33.3, 17.25), lo(300, 3, 100, 1000);
    // scipy 1.10.1 stats.ncf.cdf(0.001, 4, 12, 30) = 7.22053724420961e-13. Tolerance as above.
    [Theory]
    [InlineData(1, 3, 20, 2, 0.352555823650071)]
    [InlineData(0.01, 3, 20, 5, 0.000118438745466731)]
    [InlineData(0.001, 4, 12, 30, 7.22053724420961e-13)]
    [InlineData(2.5, 7.5, 33.3, 17.25, 0.290854326813583)]
    [InlineData(300, 3, 100, 1000, 0.229064466123643)]
    public void Lower_tails_match_the_beta_series(double f, double df1, double df2, double lambda, double expected)
    {
        Close.Relative(expected, NoncentralF.Cdf(f, df1, df2, lambda), 1e-11);
    }

    [Theory]
    [InlineData(1, 10)]
    [InlineData(3, 16)]
    [InlineData(2.5, 7.25)]
    [InlineData(12, 300)]
    public void Zero_noncentrality_is_the_central_F_and_its_power_is_alpha(double df1, double df2)
    {
        // λ = 0 leaves the single Poisson term j = 0: the central F; the power of a level-alpha test is then alpha.
        // Tolerance 1e-13 relative: log f of the critical value is found to its last bit, and the tail's elasticity
        // d log P / d log f (about 10 at 12 and 300 df) multiplies that rounding.
        foreach (var alpha in new[] { 0.05, 0.01, 0.2 })
        {
            var critical = FCritical.Upper(alpha, df1, df2);
            Close.Relative(alpha, NoncentralF.UpperTail(critical, df1, df2, 0), 1e-13);
        }

        foreach (var f in new[] { 0.01, 0.5, 1, 3, 40 })
        {
            var central = MathNet.Numerics.SpecialFunctions.BetaRegularized(df2 / 2, df1 / 2, df2 / (df2 + (df1 * f)));
            Close.Relative(central, NoncentralF.UpperTail(f, df1, df2, 0), 1e-13);
        }
    }

    [Theory]
    [InlineData(0.3, 2, 9, 0.5)]
    [InlineData(2, 4, 30, 12)]
    [InlineData(9, 1, 5, 80)]
    [InlineData(150, 6, 60, 400)]
    public void The_two_tails_add_to_one(double f, double df1, double df2, double lambda)
    {
        // each tail is summed on its own, so their sum is an independent check (tolerance: a few units of rounding per term)
        Close.Absolute(1.0, NoncentralF.Cdf(f, df1, df2, lambda) + NoncentralF.UpperTail(f, df1, df2, lambda), 1e-13);
    }

    [Fact]
    public void Power_rises_with_the_noncentrality()
    {
        var critical = FCritical.Upper(0.05, 3, 20);
        var previous = 0.0;
        foreach (var lambda in new[] { 0.0, 0.5, 2, 8, 32, 128 })
        {
            var power = NoncentralF.UpperTail(critical, 3, 20, lambda);
            Assert.True(power > previous, $"power {power} at λ {lambda} not above {previous}");
            previous = power;
        }
    }

    [Fact]
    public void Edges_and_bad_arguments_are_handled()
    {
        Assert.Equal(1.0, NoncentralF.UpperTail(0, 2, 10, 5));
        Assert.Equal(0.0, NoncentralF.UpperTail(double.PositiveInfinity, 2, 10, 5));
        Assert.True(double.IsNaN(NoncentralF.Cdf(double.NaN, 2, 10, 5)));
        Assert.Throws<ArgumentOutOfRangeException>(() => NoncentralF.UpperTail(1, 0, 10, 5));
        Assert.Throws<ArgumentOutOfRangeException>(() => NoncentralF.UpperTail(1, 2, 10, -1));
    }

    // R 4.2.2: qf(.95, 3, 16), qf(.99, 1, 2), qf(.95, 2.5, 7.25). Tolerance 1e-13 relative: both invert accurate tails.
    [Theory]
    [InlineData(0.05, 3, 16, 3.23887151745358)]
    [InlineData(0.01, 1, 2, 98.502512562814)]
    [InlineData(0.05, 2.5, 7.25, 4.43260752030771)]
    public void Critical_values_match_r_qf(double alpha, double df1, double df2, double expected)
    {
        Close.Relative(expected, FCritical.Upper(alpha, df1, df2), 1e-13);
    }

    [Fact]
    public void Poisson_weights_match_r_dpois()
    {
        // R 4.2.2: dpois(0, 2.5), dpois(3, 2.5), dpois(500, 480.5), dpois(20, 0.1). Tolerance 1e-13 relative
        // (R uses the same saddle-point form, so agreement is to rounding).
        Close.Relative(0.0820849986238988, PoissonWeight.Of(0, 2.5), 1e-13);
        Close.Relative(0.213763017249736, PoissonWeight.Of(3, 2.5), 1e-13);
        Close.Relative(0.012072269239194, PoissonWeight.Of(500, 480.5), 1e-13);
        Close.Relative(3.71916918558549e-39, PoissonWeight.Of(20, 0.1), 1e-13);
    }
}
