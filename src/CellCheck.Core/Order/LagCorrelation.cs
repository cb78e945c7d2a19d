namespace CellCheck.Core.Order;

/// <summary>Serial correlation of residuals in run order.</summary>
public static class LagCorrelation
{
    /// <summary>
    /// The lag-1 autocorrelation r1 = Σ_{t=2}^{n} e_t e_{t−1} / Σ_{t=1}^{n} e_t², with both sums about zero (not about
    /// the mean) as suits residuals of a fit with an intercept, and the full-length sum of squares in the denominator
    /// (the sample autocorrelation of time-series analysis, Box &amp; Jenkins 1976, Time Series Analysis: Forecasting
    /// and Control, with the series mean taken as zero). It is tied to the Durbin-Watson statistic by d = 2(1 − r1) − (e_1² + e_n²) / Σ e_t².
    /// NaN when n &lt; 2 or every residual is zero.
    /// </summary>
    public static double Lag1(ReadOnlySpan<double> e)
    {
        if (e.Length < 2)
        {
            return double.NaN;
        }

        var scale = 0.0;
        foreach (var v in e)
        {
            scale = Math.Max(scale, Math.Abs(v));
        }

        if (scale == 0.0)
        {
            return double.NaN;
        }

        var lagged = 0.0;
        var squares = 0.0;
        for (var t = 0; t < e.Length; t++)
        {
            var v = e[t] / scale;
            squares += v * v;
            if (t > 0)
            {
                lagged += v * (e[t - 1] / scale);
            }
        }

        return lagged / squares;
    }
}
