using CellCheck.Core.Order;
using CellCheck.Core.Tests.Statistics;

namespace CellCheck.Core.Tests.Order;

public sealed class LagCorrelationTests
{
    [Fact]
    public void Lag_one_correlation_matches_R_and_the_identity_with_durbin_watson()
    {
        var e = ReferenceSamples.Statsmodels20;

        var r1 = LagCorrelation.Lag1(e);

        // R 4.2.2: sum(e20[-1] * e20[-20]) / sum(e20^2) = 0.022329345464374893 (Fixtures/order-check-values.R);
        // r1 is small, so the sum of products cancels: 1e-12 relative allows for that (observed ~1e-15).
        Close.Relative(0.022329345464374893, r1, 1e-12);
        // d = 2(1 − r1) − (e₁² + e_n²) / Σe² (expand Σ(e_t − e_{t−1})²); identity up to rounding
        var squares = e.Sum(v => v * v);
        Close.Relative(DurbinWatson.Statistic(e), (2 * (1 - r1)) - (((e[0] * e[0]) + (e[^1] * e[^1])) / squares), 1e-14);
    }

    [Fact]
    public void Fewer_than_two_residuals_or_all_zero_residuals_give_nan()
    {
        Assert.True(double.IsNaN(LagCorrelation.Lag1([1.5])));
        Assert.True(double.IsNaN(LagCorrelation.Lag1([0.0, 0.0, 0.0])));
    }
}
