using CellCheck.Core.Data;
using CellCheck.Core.Order;
using CellCheck.Core.Statistics;
using CellCheck.Core.Tests.Statistics;

namespace CellCheck.Core.Tests.Order;

public sealed class OrderTrendTests
{
    // Least-squares slope, SE and t are closed forms: R's QR-based lm and our two-pass sums agree to rounding
    // (observed ≤ 1e-14), so 1e-12 relative; the p-value adds the t CDF (MathNet vs R pt, ~1e-14), so 1e-11.
    [Fact]
    public void Slope_on_run_position_matches_R_lm()
    {
        var result = OrderTrend.Test(ReferenceSamples.Statsmodels20);

        // R 4.2.2: t <- 1:20; summary(lm(e20 ~ t))$coefficients["t", ] (Fixtures/order-check-values.R)
        Close.Relative(0.045780000000000001, result.Slope, 1e-12);
        Close.Relative(0.039158713143278776, result.StandardError, 1e-12);
        Close.Relative(1.1690884690846310, result.T, 1e-12);
        Close.Relative(0.25761765901017281, result.P, 1e-11);
        Assert.Equal(18, result.Df);
    }

    [Fact]
    public void Counted_run_positions_give_the_doubles_of_the_same_positions_held_in_an_array()
    {
        var random = new Random(41);
        var residuals = Enumerable.Range(0, 5000).Select(i => random.NextDouble() - 0.5 + (i * 1e-5)).ToArray();
        var held = Enumerable.Range(0, 5000).Select(i => 1.7e9 + i).ToArray();

        var counted = OrderTrend.Test(residuals, RunPositions.Consecutive(1.7e9, 5000));
        var asArray = OrderTrend.Test(residuals, held.AsSpan());
        var numbered = OrderTrend.Test(residuals);
        var oneToN = OrderTrend.Test(residuals, Enumerable.Range(1, 5000).Select(i => (double)i).ToArray().AsSpan());

        var gapped = held.Select((t, i) => t + (i / 7)).ToArray(); // whole seconds with gaps: held as offsets
        Assert.True(RunPositions.From(gapped).IsWhole);
        Assert.Equal(OrderTrend.Test(residuals, gapped.AsSpan()), OrderTrend.Test(residuals, RunPositions.From(gapped)));
        Assert.Equal(asArray, counted);
        Assert.Equal(oneToN, numbered);
        Assert.Throws<ArgumentException>(() => OrderTrend.Test(residuals, RunPositions.Consecutive(1, 4999)));
    }

    [Fact]
    public void Slope_on_given_run_order_values_matches_R_lm()
    {
        var times = Enumerable.Range(1, 20).Select(i => Math.Pow(i, 1.5)).ToArray();

        var result = OrderTrend.Test(ReferenceSamples.Statsmodels20, times);

        // R 4.2.2: tt <- (1:20)^1.5; summary(lm(e20 ~ tt))$coefficients["tt", ]
        Close.Relative(0.0089684258449014963, result.Slope, 1e-12);
        Close.Relative(0.0082404589129940631, result.StandardError, 1e-12);
        Close.Relative(1.0883405814644049, result.T, 1e-12);
        Close.Relative(0.29080286260291210, result.P, 1e-11);
    }

    [Fact]
    public void Constant_run_order_or_constant_residuals_are_not_testable()
    {
        Assert.Equal(NotTestableReason.ZeroSpread, OrderTrend.Test([1.0, -1.0, 0.5], [2.0, 2.0, 2.0]).Reason);
        Assert.Equal(NotTestableReason.ZeroSpread, OrderTrend.Test([0.25, 0.25, 0.25, 0.25]).Reason);
        Assert.Equal(NotTestableReason.TooFewValues, OrderTrend.Test([1.0, -1.0]).Reason);
        Assert.Throws<ArgumentException>(() => OrderTrend.Test([1.0, -1.0, 0.5], [1.0, 2.0]));
    }

    [Fact]
    public void Residuals_on_an_exact_line_give_an_infinite_t_and_zero_p()
    {
        var result = OrderTrend.Test([-1.5, -0.5, 0.5, 1.5]); // slope exactly 1 per run, no scatter

        Assert.Equal(1.0, result.Slope);
        Assert.True(double.IsPositiveInfinity(result.T));
        Assert.Equal(0.0, result.P);
    }
}
