using System.Buffers;

namespace CellCheck.Core.Statistics;

/// <summary>
/// The Shapiro-Wilk W test of normality (Shapiro &amp; Wilk 1965, Biometrika 52, 591-611) with Royston's
/// approximations for the weights and the p-value (Royston 1992, Statistics and Computing 2, 117-119; Royston 1995,
/// "Remark AS R94", Applied Statistics 44, 547-551). Valid for 3 ≤ n ≤ 5000.
/// </summary>
/// <remarks>
/// W = (Σ aᵢ x₍ᵢ₎)² / Σ (xᵢ − x̄)², computed on the sorted values centred at their mean and divided by their range,
/// so a large common offset or scale costs no precision. P-values: for n = 3 the exact null distribution
/// p = (6/π)(asin √W − asin √(3/4)) (Shapiro &amp; Wilk 1965); for 4 ≤ n ≤ 11, −log(γ − log(1 − W)) with
/// γ = −2.273 + 0.459n is taken as normal with mean and log-SD cubic in n; for n ≥ 12, log(1 − W) is taken as
/// normal with mean cubic and log-SD quadratic in log n (Royston 1992, 1995). Royston (1995) describes these
/// approximate p-values as adequate for p &lt; 0.1; larger p-values are indicative only.
/// </remarks>
public static class ShapiroWilk
{
    private const int PoolLimit = 1 << 20;

    private const int StackLimit = 512;

    // Royston (1992, 1995) p-value polynomials, lowest power first.
    private static readonly double[] SmallMean = [0.5440, -0.39978, 0.025054, -6.714e-4];
    private static readonly double[] SmallLogSd = [1.3822, -0.77857, 0.062767, -0.0020322];
    private static readonly double[] LargeMean = [-1.5861, -0.31082, -0.083751, 0.0038915];
    private static readonly double[] LargeLogSd = [-0.4803, -0.082676, 0.0030302];

    /// <summary>
    /// Tests a sample in any order (the span is not modified; a sorted copy is made). Not testable below n = 3 or
    /// when all values are equal up to rounding; above n = 5000 the outcome keeps W but has P = NaN and reason
    /// <see cref="NotTestableReason.TooManyValues"/>. Throws <see cref="ArgumentException"/> on NaN or infinity.
    /// </summary>
    public static TestOutcome Test(ReadOnlySpan<double> sample)
    {
        SampleGuard.RequireFinite(sample, nameof(sample));
        if (sample.Length < 3)
        {
            return TestOutcome.NotTestable(NotTestableReason.TooFewValues);
        }

        double[]? rented = null;
        var sorted = sample.Length <= StackLimit
            ? stackalloc double[sample.Length]
            : sample.Length <= PoolLimit
                ? (rented = ArrayPool<double>.Shared.Rent(sample.Length)).AsSpan(0, sample.Length)
                : new double[sample.Length]; // a pool would keep arrays of millions of values alive
        try
        {
            sample.CopyTo(sorted);
            if (!RadixSort.IsAscending(sorted))
            {
                RadixSort.Sort(sorted);
            }
            return FromSorted(sorted);
        }
        finally
        {
            if (rented is not null)
            {
                ArrayPool<double>.Shared.Return(rented);
            }
        }
    }

    /// <summary>As <see cref="Test"/> for values already in ascending order (throws if they are not).</summary>
    public static TestOutcome TestSorted(ReadOnlySpan<double> sorted)
    {
        SampleGuard.RequireFinite(sorted, nameof(sorted));
        for (var i = 1; i < sorted.Length; i++)
        {
            if (sorted[i] < sorted[i - 1])
            {
                throw new ArgumentException("values must be in ascending order", nameof(sorted));
            }
        }

        return FromSorted(sorted);
    }

    /// <summary>The upper half a_n, a_(n−1), … of Royston's weight vector for n ≥ 3 (a fresh copy).</summary>
    internal static double[] Coefficients(int n) => (double[])ShapiroWilkCoefficients.Shared(n).Clone();

    /// <summary>The p-value for W from a sample of size n (3 ≤ n; the approximation is fitted up to 5000).</summary>
    internal static double PValue(double w, int n)
    {
        if (n == 3)
        {
            // exact: asin √(3/4) = π/3
            var p3 = 6.0 / Math.PI * (Math.Asin(Math.Sqrt(Math.Min(w, 1.0))) - (Math.PI / 3.0));
            return Math.Clamp(p3, 0.0, 1.0);
        }

        var oneMinusW = 1.0 - w;
        if (oneMinusW <= 0.0)
        {
            return 1.0;
        }

        var y = Math.Log(oneMinusW);
        double mean;
        double sd;
        if (n <= 11)
        {
            var gamma = -2.273 + (0.459 * n);
            if (y >= gamma)
            {
                return 0.0; // beyond the fitted transform: W far below anything the normal produces
            }

            y = -Math.Log(gamma - y);
            mean = Polynomial.Evaluate(SmallMean, n);
            sd = Math.Exp(Polynomial.Evaluate(SmallLogSd, n));
        }
        else
        {
            var u = Math.Log(n);
            mean = Polynomial.Evaluate(LargeMean, u);
            sd = Math.Exp(Polynomial.Evaluate(LargeLogSd, u));
        }

        return StandardNormal.UpperTail((y - mean) / sd);
    }

    private static TestOutcome FromSorted(ReadOnlySpan<double> x)
    {
        if (SampleGuard.ScaleFor(x) is var scale && scale != 1.0)
        {
            // Extreme magnitudes: rescale exactly by a power of two so that the range and squares stay finite.
            return FromSorted(SampleGuard.Scaled(x, scale));
        }

        var n = x.Length;
        if (n < 3)
        {
            return TestOutcome.NotTestable(NotTestableReason.TooFewValues);
        }

        if (SampleGuard.HasNoSpread(x[0], x[^1]))
        {
            return TestOutcome.NotTestable(NotTestableReason.ZeroSpread);
        }

        var w = Statistic(x);
        return n > ShapiroWilkCoefficients.CacheLimit
            ? new TestOutcome(w, double.NaN, Reason: NotTestableReason.TooManyValues)
            : new TestOutcome(w, PValue(w, n));
    }

    /// <summary>Σ aᵢ dᵢ over the stored half vector <paramref name="a"/>.</summary>
    internal static double Numerator(double[] a, ReadOnlySpan<double> x, double range)
    {
        var n = x.Length;
        var b = 0.0;
        for (var i = 0; i < a.Length; i++)
        {
            b += a[i] * ((x[n - 1 - i] - x[i]) / range);
        }

        return b;
    }

    private static double Statistic(ReadOnlySpan<double> x)
    {
        var n = x.Length;
        var range = x[^1] - x[0];

        // Numerator: the weights are antisymmetric, so Σ aᵢ x₍ᵢ₎ pairs opposite order statistics; their differences
        // do not depend on location, so no centring is needed here. Above the cache limit the weights are not stored.
        var b = n > ShapiroWilkCoefficients.CacheLimit ? ShapiroWilkCoefficients.Numerator(x, range) : Numerator(ShapiroWilkCoefficients.Shared(n), x, range);

        // Denominator: corrected two-pass sum of squares of the centred, range-scaled values.
        var centre = Descriptive.Mean(x);
        var ss = 0.0;
        var drift = 0.0;
        foreach (var v in x)
        {
            var d = (v - centre) / range;
            ss += d * d;
            drift += d;
        }

        ss -= drift * drift / n;
        return Math.Min(1.0, b * b / ss);
    }
}
