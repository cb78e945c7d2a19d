namespace CellCheck.Core.Statistics;

/// <summary>
/// Mean and the second to fourth central moments with divisor n (m_k = Σ (x − x̄)ᵏ / n) of a sample, computed about
/// a refined mean: the mean is taken about a shift, then corrected by the mean of the deviations, so values with
/// many constant leading digits keep their precision.
/// </summary>
internal readonly record struct CentralMoments(int Count, double Mean, double M2, double M3, double M4)
{
    /// <summary>Computes the moments of <paramref name="x"/>; all NaN for an empty span.</summary>
    internal static CentralMoments Of(ReadOnlySpan<double> x)
    {
        var n = x.Length;
        if (n == 0)
        {
            return new CentralMoments(0, double.NaN, double.NaN, double.NaN, double.NaN);
        }

        var mean = Descriptive.Mean(x);
        var drift = 0.0;
        foreach (var v in x)
        {
            drift += v - mean;
        }

        var correction = drift / n;
        double s2 = 0.0, s3 = 0.0, s4 = 0.0;
        foreach (var v in x)
        {
            var d = v - mean - correction;
            var d2 = d * d;
            s2 += d2;
            s3 += d2 * d;
            s4 += d2 * d2;
        }

        return new CentralMoments(n, mean + correction, s2 / n, s3 / n, s4 / n);
    }
}
