using CellCheck.Core.Statistics;

namespace CellCheck.Core.Plots;

/// <summary>
/// The reference line of a normal QQ plot: through the points (Φ⁻¹(1/4), Q1) and (Φ⁻¹(3/4), Q3), where Q1 and Q3 are
/// the sample quartiles by linear interpolation between order statistics (Hyndman &amp; Fan 1996, type 7). Its
/// intercept and slope are robust estimates of the sample's location and scale.
/// </summary>
public static class QuartileLine
{
    /// <summary>Φ⁻¹(3/4), the upper quartile of the standard normal.</summary>
    public static readonly double NormalQuartile = StandardNormal.Quantile(0.75);

    /// <summary>The line for values sorted in increasing order (at least one value). With equal quartiles the slope is 0.</summary>
    public static LineCoefficients Through(ReadOnlySpan<double> sorted)
    {
        if (sorted.IsEmpty)
        {
            throw new ArgumentException("at least one value is required", nameof(sorted));
        }

        var q1 = Quantile(sorted, 0.25);
        var q3 = Quantile(sorted, 0.75);
        var slope = (q3 - q1) / (2 * NormalQuartile);
        return new LineCoefficients((q1 + q3) / 2, slope);
    }

    /// <summary>The type-7 sample quantile of sorted values: x[h] interpolated at h = (n − 1) p.</summary>
    public static double Quantile(ReadOnlySpan<double> sorted, double p)
    {
        var h = (sorted.Length - 1) * p;
        var lo = (int)Math.Floor(h);
        var hi = Math.Min(lo + 1, sorted.Length - 1);
        return sorted[lo] + ((h - lo) * (sorted[hi] - sorted[lo]));
    }
}
