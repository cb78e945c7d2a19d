using System.Buffers;

namespace CellCheck.Core.Statistics;

/// <summary>
/// The Anderson-Darling test of normality with mean and variance estimated from the sample (Anderson &amp; Darling
/// 1952, Annals of Mathematical Statistics 23, 193-212; 1954, JASA 49, 765-769), with the p-value of Stephens
/// (1986, in D'Agostino &amp; Stephens, Goodness-of-Fit Techniques, Marcel Dekker, ch. 4). Valid for n ≥ 8.
/// </summary>
/// <remarks>
/// A² = −n − (1/n) Σ (2i − 1) [log Φ(z₍ᵢ₎) + log(1 − Φ(z₍ₙ₊₁₋ᵢ₎))], z = (x − x̄)/s with s the n − 1 standard
/// deviation. The reported statistic is this unmodified A². The p-value uses the modified A* = A²(1 + 0.75/n +
/// 2.25/n²) in the four-piece formula of D'Agostino &amp; Stephens (1986) Table 4.9, an empirical fit to the null
/// distribution, so p-values carry that fit's error rather than full precision. The pieces meet with small steps
/// as published (−0.0033 at A* = 0.34, +0.0025 at 0.6). The last piece, exp(1.2937 − 5.709A* + 0.0186A*²), turns
/// upward beyond its minimum at A* = 5.709/0.0372 ≈ 153.5; above that point the p-value is held at that minimum
/// (about 1e-190). Both log terms use a log Φ that stays finite far in the tails. A² = −n − S/n is a small
/// difference of two numbers near n, so S, the mean and the SD are summed with Neumaier's (1974) compensation: with plain
/// sums, A² ≈ 105 at n = 10⁶ was off by 4e-8 (tests/CellCheck.Core.Tests/Scale).
/// </remarks>
public static class AndersonDarling
{
    private const int PoolLimit = 1 << 20;

    private const int StackLimit = 512;
    private const double TurningPoint = 5.709 / (2.0 * 0.0186);

    /// <summary>
    /// Tests a sample in any order (not modified). Not testable below n = 8 or when all values are equal up to
    /// rounding. Throws <see cref="ArgumentException"/> on NaN or infinity.
    /// </summary>
    public static TestOutcome Test(ReadOnlySpan<double> sample)
    {
        SampleGuard.RequireFinite(sample, nameof(sample));
        if (sample.Length < 8)
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

            return TestSortedInPlace(sorted);
        }
        finally
        {
            if (rented is not null)
            {
                ArrayPool<double>.Shared.Return(rented);
            }
        }
    }

    /// <summary>Stephens' (1986) modification for estimated mean and variance: A* = A²(1 + 0.75/n + 2.25/n²).</summary>
    public static double ModifiedStatistic(double a2, int n) => a2 * (1.0 + (0.75 / n) + (2.25 / ((double)n * n)));

    /// <summary>The upper-tail p-value for a modified statistic A* (D'Agostino &amp; Stephens 1986, Table 4.9).</summary>
    internal static double PValue(double modified)
    {
        var a = modified;
        double p;
        if (a < 0.2)
        {
            p = 1.0 - Math.Exp(-13.436 + (101.14 * a) - (223.73 * a * a));
        }
        else if (a < 0.34)
        {
            p = 1.0 - Math.Exp(-8.318 + (42.796 * a) - (59.938 * a * a));
        }
        else if (a < 0.6)
        {
            p = Math.Exp(0.9177 - (4.279 * a) - (1.38 * a * a));
        }
        else
        {
            a = Math.Min(a, TurningPoint);
            p = Math.Exp(1.2937 - (5.709 * a) + (0.0186 * a * a));
        }

        return Math.Clamp(p, 0.0, 1.0);
    }

    /// <summary>As <see cref="Test"/> for finite values already in ascending order, which it overwrites (rescaled and
    /// centred): for a caller that holds a sorted copy it no longer needs, such as the pooled checks on millions of values.</summary>
    internal static TestOutcome TestSortedInPlace(Span<double> sorted) => TestSortedInPlace(sorted, null);

    /// <summary>As <see cref="TestSortedInPlace(Span{double})"/> on the first <paramref name="length"/> values of an
    /// array, whose terms on a long sample are then computed side by side (<see cref="AndersonDarlingSum"/>).</summary>
    internal static TestOutcome TestSortedInPlace(double[] sorted, int length) => TestSortedInPlace(sorted.AsSpan(0, length), sorted);

    private static TestOutcome TestSortedInPlace(Span<double> sorted, double[]? array)
    {
        if (sorted.Length < 8)
        {
            return TestOutcome.NotTestable(NotTestableReason.TooFewValues);
        }

        if (SampleGuard.HasNoSpread(sorted[0], sorted[^1]))
        {
            return TestOutcome.NotTestable(NotTestableReason.ZeroSpread);
        }

        // Rescale extreme magnitudes (exact, by a power of two), then centre about the middle order statistic:
        // x − x₍ₘ₎ is exact for values with many constant leading digits, so the standardised values are not
        // rounded at the data's magnitude. Both keep the order and leave A² unchanged.
        var scale = SampleGuard.ScaleFor(sorted);
        var origin = sorted[sorted.Length / 2] * scale;
        if (array is not null)
        {
            // each value on its own: ranges of a long sample side by side
            GroupChunks.ForEachRange(sorted.Length, (from, to) => Centre(array.AsSpan(from, to - from), scale, origin));
            return Outcome(AndersonDarlingSum.Statistic(array, sorted.Length), sorted.Length);
        }

        Centre(sorted, scale, origin);
        return Outcome(AndersonDarlingSum.Statistic(sorted), sorted.Length);
    }

    private static TestOutcome Outcome(double a2, int n) => new(a2, PValue(ModifiedStatistic(a2, n)));

    private static void Centre(Span<double> values, double scale, double origin)
    {
        for (var i = 0; i < values.Length; i++)
        {
            values[i] = (values[i] * scale) - origin;
        }
    }
}
