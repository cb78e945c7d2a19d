using CellCheck.Core.Order;
using CellCheck.Core.Tests.Statistics;

namespace CellCheck.Core.Tests.Order;

public sealed class DurbinWatsonLargeDesignTests
{
    [Theory]
    // R (Fixtures/order-check-values.R): n = 400, intercept and indicators of blocks 2-4 of 100 consecutive runs;
    // exact P(d ≤ d0) from R's eigen() and integrate(), and the normal approximation with the exact moments.
    [InlineData(1.8, 0.015503994042662228, 0.015555396336762558)]
    [InlineData(1.9, 0.12471347277101125, 0.1244503597569793)]
    [InlineData(2.0, 0.44024062542547038, 0.44022673914942778)]
    [InlineData(2.1, 0.80260418709662273, 0.80295810619216512)]
    public void Exact_and_normal_probabilities_for_four_hundred_runs_match_R_and_each_other(double d0, double exact, double normal)
    {
        var distribution = new DurbinWatsonDistribution(ProjectedDifference.FromDesign(Blocks400()));

        var (probability, errorBound) = distribution.ExactCdf(d0);

        // exact: integration error bound 1e-10 (observed bound printed on failure); R's integrate to ~1e-13.
        Close.Absolute(exact, probability, 1e-10);
        Assert.True(errorBound < 1e-10, $"error bound {errorBound:E2}");
        // normal: closed form from the trace moments; Φ in R and here agree to ~1e-15, so 1e-12 relative.
        Close.Relative(normal, distribution.NormalCdf(d0), 1e-12);
        // at n = 400 the normal approximation errs by O(1/√n) in shape; within 0.01 of the exact value
        // (R: largest gap 3.6e-4 at these points).
        Close.Absolute(probability, distribution.NormalCdf(d0), 0.01);
    }

    [Fact]
    public void Above_the_exact_limit_the_test_switches_to_the_normal_approximation()
    {
        var x = Blocks400();
        var e = new double[400];
        for (var t = 0; t < 400; t++)
        {
            e[t] = Math.Sin(0.7 * t) + (0.3 * Math.Cos(2.9 * t)); // a fixed residual pattern, then projected by M
        }

        var residuals = OrderFixtures.Residuals(x, e);
        var exact = DurbinWatson.Test(residuals, x);
        var approximate = DurbinWatson.Test(residuals, x, exactLimit: 399);

        Assert.Equal(OrderMethods.Exact, exact.Method);
        Assert.Equal(OrderMethods.NormalApproximation, approximate.Method);
        Assert.Equal(exact.D, approximate.D);
        Assert.Equal(exact.ExpectedD, approximate.ExpectedD);
        // R: E[d] = 2.0150000000000006 for this design (rounding only)
        Close.Relative(2.0150000000000006, exact.ExpectedD, 1e-12);
        Close.Absolute(exact.P, approximate.P, 0.01); // as in the theory above
    }

    private static double[,] Blocks400()
    {
        var x = new double[400, 4];
        for (var t = 0; t < 400; t++)
        {
            x[t, 0] = 1;
            var block = t / 100;
            for (var j = 1; j < 4; j++)
            {
                x[t, j] = block == j ? 1 : 0;
            }
        }

        return x;
    }
}
