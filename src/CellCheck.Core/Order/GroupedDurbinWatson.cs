using CellCheck.Core.Statistics;

namespace CellCheck.Core.Order;

/// <summary>
/// The Durbin-Watson test for residuals of the cell-means model (a design of group indicators), with the exact null
/// mean and variance of d computed in O(n) time and memory from the run sequence of the groups, and the p-value from
/// the normal distribution with those moments (as <see cref="DurbinWatson"/> does above its exact limit; Durbin &amp;
/// Watson 1971, Biometrika 58, 1-19). For a million rows the dense route would need an n × p design matrix.
/// </summary>
/// <remarks>
/// With H = Σ_c 1_c1_cᵀ/n_c, M = I − H, A = DᵀD (D the first difference), ν = n − p:
/// tr(MA) = 2(n − 1) − Σ_c b_c/n_c, where b_c = 1_cᵀA1_c counts the steps that enter or leave group c;
/// tr((MA)²) = tr(A²) − 2·tr(HA²) + tr(HAHA) with tr(A²) = 6n − 8, tr(HA²) = Σ_c ‖A1_c‖²/n_c and
/// tr(HAHA) = Σ_{c,c'} (1_cᵀA1_c')²/(n_c n_c'), where 1_cᵀA1_c' = −(steps between c and c') for c ≠ c'.
/// Then E[d] = tr(MA)/ν and Var[d] = 2(ν·tr((MA)²) − tr(MA)²)/(ν²(ν + 2)) (Durbin &amp; Watson 1950, §3).
/// </remarks>
public static class GroupedDurbinWatson
{
    /// <param name="residuals">Residuals of the cell-means fit, in run order.</param>
    /// <param name="group">The group (cell) of each residual, in run order, numbered 0 .. groups − 1.</param>
    public static DurbinWatsonResult Test(ReadOnlySpan<double> residuals, ReadOnlySpan<int> group, int groups,
        DurbinWatsonAlternative alternative = DurbinWatsonAlternative.Positive)
    {
        if (group.Length != residuals.Length)
        {
            throw new ArgumentException("one group per residual is required", nameof(group));
        }

        var (mean, variance, p) = Moments(group, groups);
        var n = residuals.Length;
        if (n < p + 2)
        {
            return new DurbinWatsonResult(double.NaN, double.NaN, double.NaN, double.NaN, OrderMethods.None, alternative, NotTestableReason.TooFewValues);
        }

        return Normal(residuals, mean, variance, alternative);
    }

    /// <summary>d of the residuals referred to the normal distribution with the given exact mean and variance
    /// (not testable when every residual is zero).</summary>
    internal static DurbinWatsonResult Normal(ReadOnlySpan<double> residuals, double mean, double variance, DurbinWatsonAlternative alternative)
    {
        var d = DurbinWatson.Statistic(residuals);
        if (double.IsNaN(d))
        {
            return new DurbinWatsonResult(d, double.NaN, mean, variance, OrderMethods.None, alternative, NotTestableReason.ZeroSpread);
        }

        var z = (d - mean) / Math.Sqrt(variance);
        var pValue = alternative switch
        {
            DurbinWatsonAlternative.Positive => StandardNormal.Cdf(z),
            DurbinWatsonAlternative.Negative => StandardNormal.UpperTail(z),
            _ => Math.Min(1.0, 2.0 * Math.Min(StandardNormal.Cdf(z), StandardNormal.UpperTail(z))),
        };
        return new DurbinWatsonResult(d, pValue, mean, variance, OrderMethods.NormalApproximation, alternative);
    }

    /// <summary>E[d], Var[d] and the number of groups present (p) for a group sequence in run order.</summary>
    public static (double Mean, double Variance, int Groups) Moments(ReadOnlySpan<int> group, int groups)
    {
        var (traceMA, traceMA2, p) = GroupTraces.Of(group, groups);
        return (traceMA / (group.Length - p), Variance(traceMA, traceMA2, group.Length - p), p);
    }

    /// <summary>Var[d] = 2(ν·tr((MA)²) − tr(MA)²)/(ν²(ν + 2)).</summary>
    internal static double Variance(double traceMA, double traceMA2, double nu) =>
        Math.Max(0.0, 2.0 * ((nu * traceMA2) - (traceMA * traceMA)) / (nu * nu * (nu + 2)));
}
