namespace CellCheck.Core.Statistics;

/// <summary>
/// Numerically careful descriptive statistics on spans. Sums are taken about a shift (the first value) and then
/// corrected (the corrected two-pass algorithm of Chan, Golub &amp; LeVeque 1983), so values with many constant
/// leading digits (NIST StRD SmLs07-09) keep their precision.
/// </summary>
public static class Descriptive
{
    /// <summary>Arithmetic mean; NaN for an empty span.</summary>
    public static double Mean(ReadOnlySpan<double> x)
    {
        if (x.IsEmpty)
        {
            return double.NaN;
        }

        var shift = x[0];
        var sum = 0.0;
        foreach (var v in x)
        {
            sum += v - shift;
        }

        return shift + (sum / x.Length);
    }

    /// <summary>Sum of squared deviations about the mean, by the corrected two-pass formula.</summary>
    public static double SumOfSquares(ReadOnlySpan<double> x) => SumOfSquares(x, Mean(x));

    /// <summary>Sum of squared deviations about a given mean, with the correction term for the rounding error of the mean.</summary>
    public static double SumOfSquares(ReadOnlySpan<double> x, double mean)
    {
        if (x.IsEmpty)
        {
            return double.NaN;
        }

        var ss = 0.0;
        var comp = 0.0;
        foreach (var v in x)
        {
            var d = v - mean;
            ss += d * d;
            comp += d;
        }

        return Math.Max(0.0, ss - (comp * comp / x.Length));
    }

    /// <summary>Sample variance with divisor n − 1; NaN when n &lt; 2.</summary>
    public static double Variance(ReadOnlySpan<double> x) => x.Length < 2 ? double.NaN : SumOfSquares(x) / (x.Length - 1);

    /// <summary>Sample standard deviation with divisor n − 1; NaN when n &lt; 2.</summary>
    public static double StandardDeviation(ReadOnlySpan<double> x) => Math.Sqrt(Variance(x));

    /// <summary>Median (mean of the two middle values for even n). Uses <paramref name="scratch"/> (length ≥ n below <see cref="RadixLimit"/> values) and leaves it reordered.</summary>
    public static double Median(ReadOnlySpan<double> x, Span<double> scratch)
    {
        if (x.IsEmpty)
        {
            return double.NaN;
        }

        var (lower, upper) = MiddleOrderStatistics(x, scratch);
        return x.Length % 2 == 1 ? upper : 0.5 * (lower + upper);
    }

    /// <summary>
    /// The order statistics at n/2 − 1 (<c>Lower</c>, only for even n: otherwise NaN) and n/2 (<c>Upper</c>), 0-based, of a
    /// non-empty span, as <see cref="Median(ReadOnlySpan{double}, Span{double})"/> finds them (sort up to 64 values,
    /// selection above, radix selection from <see cref="RadixLimit"/>). Uses <paramref name="scratch"/> (length ≥ n,
    /// unused from <see cref="RadixLimit"/>) and leaves it reordered.
    /// </summary>
    internal static (double Lower, double Upper) MiddleOrderStatistics(ReadOnlySpan<double> x, Span<double> scratch)
    {
        if (x.Length >= RadixLimit)
        {
            // long samples: counted by digits in place, without a copy (the scratch is left untouched)
            var pair = RadixSelection.SelectPair(x, x.Length / 2);
            return x.Length % 2 == 1 ? (double.NaN, pair.Upper) : pair;
        }

        var s = scratch[..x.Length];
        x.CopyTo(s);
        var mid = s.Length / 2;
        if (s.Length <= 64)
        {
            s.Sort();
            return s.Length % 2 == 1 ? (double.NaN, s[mid]) : (s[mid - 1], s[mid]);
        }

        // selection instead of a full sort: linear time for the millions of residuals of a large design
        var upper = Selection.Select(s, mid);
        if (s.Length % 2 == 1)
        {
            return (double.NaN, upper);
        }

        var lower = double.NegativeInfinity;
        foreach (var v in s[..mid])
        {
            lower = Math.Max(lower, v);
        }

        return (lower, upper);
    }

    /// <summary>Median of a span (allocates a scratch copy below <see cref="RadixLimit"/> values; use the scratch overload in hot loops).</summary>
    public static double Median(ReadOnlySpan<double> x) => Median(x, x.Length >= RadixLimit ? [] : new double[x.Length]);

    /// <summary>From this many values the middle order statistics come from <see cref="RadixSelection"/> (four
    /// counting passes, no copy) rather than from selection in a copy; below it the fixed cost of its digit table
    /// (65 536 counts a pass) outweighs the copy.</summary>
    internal const int RadixLimit = 1 << 16;

    /// <summary>True when every value equals the first (zero spread).</summary>
    public static bool IsConstant(ReadOnlySpan<double> x)
    {
        for (var i = 1; i < x.Length; i++)
        {
            if (x[i] != x[0])
            {
                return false;
            }
        }

        return true;
    }
}
