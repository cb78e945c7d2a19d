using MathNet.Numerics.Random;

namespace CellCheck.Core.Plots;

/// <summary>
/// Seeded simulation envelopes for normal QQ plots (in the manner of Atkinson 1981, Biometrika 68, 13-20, and
/// Atkinson 1985, Plots, Transformations and Regression, §4.2).
/// </summary>
/// <remarks>
/// Method: draw <c>m</c> samples of n standard normal values (Box-Muller on MathNet's xoshiro256** generator, seeded
/// by the seed and n, so every cell of the same size gets the same envelope and the pictures are reproducible). Sort
/// each sample and standardise it by its own mean and standard deviation (n − 1 divisor), s_i = (z_(i) − z̄)/s_z,
/// exactly as the plotted values are; at each position i take the k-th smallest and the k-th largest of the m
/// standardised values, k = round(0.025 (m + 1)). With the default m = 199, k = 5: a new standardised sample's i-th
/// value falls between the 5th and the 195th of the 199 with probability 190/200 = 0.95 exactly (its rank among the 200
/// is uniform), so the band is a 95% pointwise envelope. Because every sample is standardised by its own mean and SD,
/// the band allows for their estimation; mapped through the plotted values' mean and SD (value = mean + SD · s) it is
/// drawn on the data scale. Mean and SD are used rather than the quartiles, because standardising by the quartile line
/// pins the order statistics next to the quartiles and pinches the band there. For residuals of a cell-means model the
/// standardised residuals equal the standardised data, so the band is exact under normality; for residuals of other
/// models (which are correlated) and for pooled studentized residuals it is an approximation. The band is pointwise:
/// with many positions some points outside it are expected.
/// </remarks>
public static class QqEnvelopes
{
    /// <summary>
    /// The 95% pointwise band of the normal order statistics at the given ranks of n, from their exact distribution
    /// rather than by simulation (for samples too large to simulate): the i-th smallest of n standard normal values is
    /// Φ⁻¹(U) with U ~ Beta(i, n − i + 1) (David &amp; Nagaraja 2003, Order Statistics, §2.1), so the band is
    /// Φ⁻¹ of the Beta's 2.5% and 97.5% quantiles; where both Beta parameters exceed 1000 its normal approximation
    /// (mean i/(n + 1), variance p(1 − p)/(n + 2)) is used. It does not allow for estimating the mean and SD, which at
    /// the sizes it is used for (over <see cref="PointThinning.MaxPoints"/> values) changes the band by a negligible amount.
    /// </summary>
    public static QqEnvelope OrderStatistics(int n, IReadOnlyList<int> ranks)
    {
        ArgumentNullException.ThrowIfNull(ranks);
        var lower = new double[ranks.Count];
        var upper = new double[ranks.Count];
        var z = Statistics.StandardNormal.Quantile(0.975);
        for (var k = 0; k < ranks.Count; k++)
        {
            var a = ranks[k] + 1.0;
            var b = n - ranks[k] + 0.0;
            double lo, hi;
            if (Math.Min(a, b) > 1000)
            {
                var p = a / (n + 1.0);
                var sd = Math.Sqrt(p * (1 - p) / (n + 2.0));
                (lo, hi) = (p - (z * sd), p + (z * sd));
            }
            else
            {
                (lo, hi) = (MathNet.Numerics.Distributions.Beta.InvCDF(a, b, 0.025), MathNet.Numerics.Distributions.Beta.InvCDF(a, b, 0.975));
            }

            lower[k] = Statistics.StandardNormal.Quantile(lo);
            upper[k] = Statistics.StandardNormal.Quantile(hi);
        }

        return new QqEnvelope(lower, upper, 0.95);
    }

    /// <summary>Default number of simulated samples.</summary>
    public const int DefaultDraws = 199;

    /// <summary>The envelope for samples of size n (n ≥ 3).</summary>
    public static QqEnvelope Simulate(int n, int seed, int draws = DefaultDraws)
    {
        ArgumentOutOfRangeException.ThrowIfLessThan(n, 3);
        ArgumentOutOfRangeException.ThrowIfLessThan(draws, 39);
        var k = (int)Math.Round(0.025 * (draws + 1), MidpointRounding.AwayFromZero);
        var random = new Xoshiro256StarStar(Mix(seed, n), threadSafe: false);
        var byPosition = new double[n][];
        for (var i = 0; i < n; i++)
        {
            byPosition[i] = new double[draws];
        }

        var sample = new double[n];
        for (var d = 0; d < draws; d++)
        {
            for (var i = 0; i < n; i++)
            {
                sample[i] = Normal(random);
            }

            Array.Sort(sample);
            var (mean, sd) = MeanSd(sample);
            for (var i = 0; i < n; i++)
            {
                byPosition[i][d] = (sample[i] - mean) / sd;
            }
        }

        var lower = new double[n];
        var upper = new double[n];
        for (var i = 0; i < n; i++)
        {
            (lower[i], upper[i]) = Tails(byPosition[i], k);
        }

        return new QqEnvelope(lower, upper, (draws + 1 - (2.0 * k)) / (draws + 1));
    }

    /// <summary>The k-th smallest and the k-th largest of <paramref name="values"/> (k ≤ 16, at most half of them): the
    /// values a sort would put at k − 1 and at length − k, from one pass that keeps the k smallest and the k largest met
    /// (the largest as the smallest of the negated values; negation is exact).</summary>
    internal static (double Low, double High) Tails(ReadOnlySpan<double> values, int k)
    {
        ArgumentOutOfRangeException.ThrowIfGreaterThan(k, 16);
        ArgumentOutOfRangeException.ThrowIfGreaterThan(2 * k, values.Length);
        Span<double> low = stackalloc double[k]; // ascending: the k smallest so far
        Span<double> negatedHigh = stackalloc double[k]; // ascending: the k largest so far, negated
        for (var i = 0; i < values.Length; i++)
        {
            var kept = Math.Min(i, k);
            KeepSmallest(low, kept, values[i]);
            KeepSmallest(negatedHigh, kept, -values[i]);
        }

        return (low[k - 1], -negatedHigh[k - 1]);
    }

    /// <summary>Puts <paramref name="v"/> in its place among the <paramref name="kept"/> smallest values so far, held
    /// ascending in <paramref name="smallest"/>, when it is one of them (the largest then falls out once it is full).</summary>
    private static void KeepSmallest(Span<double> smallest, int kept, double v)
    {
        if (kept == smallest.Length && !(v < smallest[^1]))
        {
            return;
        }

        var at = Math.Min(kept, smallest.Length - 1);
        for (; at > 0 && smallest[at - 1] > v; at--)
        {
            smallest[at] = smallest[at - 1];
        }

        smallest[at] = v;
    }

    /// <summary>Mean and standard deviation (n − 1 divisor) of the values, by two passes.</summary>
    public static (double Mean, double Sd) MeanSd(ReadOnlySpan<double> values)
    {
        var mean = 0.0;
        foreach (var v in values)
        {
            mean += v;
        }

        mean /= values.Length;
        var ss = 0.0;
        foreach (var v in values)
        {
            ss += (v - mean) * (v - mean);
        }

        return (mean, values.Length > 1 ? Math.Sqrt(ss / (values.Length - 1)) : 0.0);
    }

    private static double Normal(Random random)
    {
        var u1 = 1.0 - random.NextDouble();
        var u2 = random.NextDouble();
        return Math.Sqrt(-2.0 * Math.Log(u1)) * Math.Cos(2.0 * Math.PI * u2);
    }

    /// <summary>SplitMix64 finaliser of (seed, n), folded to a 32-bit seed.</summary>
    private static int Mix(int seed, int n)
    {
        var z = unchecked(((ulong)(uint)seed << 32) + (ulong)(uint)n + 0x9E3779B97F4A7C15UL);
        z = unchecked((z ^ (z >> 30)) * 0xBF58476D1CE4E5B9UL);
        z = unchecked((z ^ (z >> 27)) * 0x94D049BB133111EBUL);
        z ^= z >> 31;
        return unchecked((int)(z ^ (z >> 32)));
    }
}
