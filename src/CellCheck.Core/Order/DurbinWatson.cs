using CellCheck.Core.Statistics;

namespace CellCheck.Core.Order;

/// <summary>
/// The Durbin-Watson test for first-order autocorrelation of errors in run order (Durbin &amp; Watson 1950, 1951,
/// "Testing for serial correlation in least squares regression I, II", Biometrika 37, 409-428; 38, 159-178), with the
/// p-value from the exact null distribution of d for the fitted design rather than from bounds.
/// </summary>
/// <remarks>
/// <para>Exact p (n ≤ exactLimit): P(d ≤ d_obs) = P(Σ (λ_i − d_obs) z_i² ≤ 0) over the n − p eigenvalues λ_i of
/// M A M (see <see cref="DurbinWatsonDistribution"/>), integrated by Imhof's (1961) formula with the trapezoidal
/// rule on a logarithmic scale (see <see cref="QuadraticFormCdf"/>), with an absolute error bound below 1e-10
/// (at most 6.6e-14 on every design in the tests, whose deviations from R's two independent integrations are at most 3e-14).
/// The eigenvalues cost O(n³) time and n²/2 doubles: on the 2-core development machine (Release build) about
/// 0.1 s at n = 400, 0.8 s at n = 1000, 1.3 s at n = 1500 and 11 s at n = 3000, the default limit; the
/// integration itself takes milliseconds.</para>
/// <para>Approximate p (n &gt; exactLimit): d is referred to the normal distribution with its exact mean and
/// variance for this design, computed from traces in O(np²) time (Durbin &amp; Watson 1971, Biometrika 58, 1-19,
/// discuss this and better-fitting approximations; the normal one errs by O(1/√(n − p)) in the tails).</para>
/// <para>The errors are assumed normal and independent with equal variance under the null hypothesis; the residuals
/// must be those of the least-squares fit of the given design, with rows in run order.</para>
/// </remarks>
public static class DurbinWatson
{
    /// <summary>Tests the residuals of a least-squares fit for first-order autocorrelation in run order.</summary>
    /// <param name="residuals">Residuals e = My of the fit, in run order.</param>
    /// <param name="x">The fitted model's full-rank n × p design matrix, rows in run order, intercept column
    /// included by the caller.</param>
    /// <param name="alternative">Which departure the p-value is computed against.</param>
    /// <param name="exactLimit">Largest n for which the exact distribution is used.</param>
    /// <exception cref="ArgumentException">The design's row count differs from the residual count, a value is
    /// not finite, or the design columns are linearly dependent.</exception>
    public static DurbinWatsonResult Test(
        ReadOnlySpan<double> residuals,
        double[,] x,
        DurbinWatsonAlternative alternative = DurbinWatsonAlternative.Positive,
        int exactLimit = 3000)
    {
        ArgumentNullException.ThrowIfNull(x);
        var n = residuals.Length;
        if (x.GetLength(0) != n)
        {
            throw new ArgumentException($"The design has {x.GetLength(0)} rows but there are {n} residuals.", nameof(x));
        }

        SampleGuard.RequireFinite(residuals, nameof(residuals));
        foreach (var value in x)
        {
            if (!double.IsFinite(value))
            {
                throw new ArgumentException("Design values must be finite.", nameof(x));
            }
        }

        if (n < x.GetLength(1) + 2)
        {
            return NotTestable(NotTestableReason.TooFewValues, double.NaN, double.NaN, alternative);
        }

        var distribution = new DurbinWatsonDistribution(ProjectedDifference.FromDesign(x));
        var d = Statistic(residuals);
        if (double.IsNaN(d))
        {
            return NotTestable(NotTestableReason.ZeroSpread, distribution.Mean, distribution.Variance, alternative);
        }

        double lower;
        double upper;
        string method;
        if (n <= exactLimit)
        {
            lower = distribution.ExactCdf(d).Probability;
            upper = 1.0 - lower;
            method = OrderMethods.Exact;
        }
        else
        {
            lower = distribution.NormalCdf(d);
            upper = distribution.NormalUpperTail(d);
            method = OrderMethods.NormalApproximation;
        }

        var p = alternative switch
        {
            DurbinWatsonAlternative.Positive => lower,
            DurbinWatsonAlternative.Negative => upper,
            _ => Math.Min(1.0, 2.0 * Math.Min(lower, upper)),
        };
        return new DurbinWatsonResult(d, p, distribution.Mean, distribution.Variance, method, alternative);
    }

    /// <summary>d = Σ_{t≥2} (e_t − e_{t−1})² / Σ e_t², or NaN when every residual is zero. The residuals are scaled by
    /// their largest magnitude first, so squares neither overflow nor underflow.</summary>
    public static double Statistic(ReadOnlySpan<double> residuals)
    {
        var scale = 0.0;
        foreach (var e in residuals)
        {
            scale = Math.Max(scale, Math.Abs(e));
        }

        if (scale == 0.0)
        {
            return double.NaN;
        }

        var differences = 0.0;
        var squares = 0.0;
        for (var t = 0; t < residuals.Length; t++)
        {
            var e = residuals[t] / scale;
            squares += e * e;
            if (t > 0)
            {
                var step = e - (residuals[t - 1] / scale);
                differences += step * step;
            }
        }

        return differences / squares;
    }

    private static DurbinWatsonResult NotTestable(string reason, double mean, double variance, DurbinWatsonAlternative alternative) =>
        new(double.NaN, double.NaN, mean, variance, OrderMethods.None, alternative, reason);
}
