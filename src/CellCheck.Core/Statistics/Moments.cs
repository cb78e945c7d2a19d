namespace CellCheck.Core.Statistics;

/// <summary>
/// Moment statistics of a sample: mean, variance (divisor n − 1) and the moment estimators of skewness
/// g1 = m3/m2^(3/2) and excess kurtosis g2 = m4/m2² − 3, with central moments m_k = Σ (x − x̄)ᵏ / n (as in
/// D'Agostino, Belanger &amp; D'Agostino 1990, The American Statistician 44, 316-321, where √b1 = g1 and
/// b2 = g2 + 3). These are the plain moment estimators, not the bias-adjusted G1/G2 of Joanes &amp; Gill (1998).
/// </summary>
public static class Moments
{
    /// <summary>
    /// Summarises a sample (any order, not modified). Variance and SD are NaN below n = 2; skewness is NaN below
    /// n = 3 and kurtosis below n = 4, and both are NaN when the values are equal up to rounding (range at most
    /// 32 units in the last place of the largest magnitude). Throws <see cref="ArgumentException"/> on NaN or
    /// infinity.
    /// </summary>
    public static MomentSummary Summarize(ReadOnlySpan<double> sample)
    {
        SampleGuard.RequireFinite(sample, nameof(sample));
        var n = sample.Length;
        var moments = CentralMoments.Of(sample);
        var variance = n < 2 ? double.NaN : moments.M2 * n / (n - 1);
        var noSpread = SampleGuard.HasNoSpread(sample);
        var skewness = n < 3 || noSpread ? double.NaN : moments.M3 / Math.Pow(moments.M2, 1.5);
        var kurtosis = n < 4 || noSpread ? double.NaN : (moments.M4 / (moments.M2 * moments.M2)) - 3.0;
        return new MomentSummary(n, moments.Mean, variance, Math.Sqrt(variance), skewness, kurtosis);
    }
}
