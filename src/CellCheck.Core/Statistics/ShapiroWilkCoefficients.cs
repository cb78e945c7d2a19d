namespace CellCheck.Core.Statistics;

/// <summary>
/// The Shapiro-Wilk weights a by Royston's approximation (Royston 1992, Statistics and Computing 2, 117-119;
/// Royston 1995, Applied Statistics 44, 547-551, algorithm AS R94). Only the upper half a_n, a_(n−1), … is kept:
/// the vector is antisymmetric (a_(n+1−i) = −a_i) and, for odd n, its middle weight is zero.
/// </summary>
/// <remarks>
/// Normal scores are approximated by Blom's (1958) m_i = Φ⁻¹((i − 3/8)/(n + 1/4)), with Φ⁻¹ evaluated through
/// MathNet.Numerics' inverse complementary error function (rational approximations to double precision). The two outermost weights come from
/// Royston's polynomials in u = n^(−1/2) added to m_i/√(m'm) (only a_n when n ≤ 5); the others are m_i/√φ, where φ
/// makes the whole vector unit length. For n = 3 the exact value a_3 = √(1/2) is used. Vectors are cached per n
/// up to 5000 (lock-free: two threads may compute the same vector, one copy wins, both are equal).
/// </remarks>
internal static class ShapiroWilkCoefficients
{
    /// <summary>Largest n whose vector is cached; also the upper limit of the p-value approximation.</summary>
    internal const int CacheLimit = 5000;

    // Royston (1992) polynomials in u = 1/√n for a_n and a_(n−1), lowest power first.
    private static readonly double[] Last = [0.0, 0.221157, -0.147981, -2.071190, 4.434685, -2.706056];
    private static readonly double[] NextToLast = [0.0, 0.042981, -0.293762, -1.752461, 5.682633, -3.582633];

    private static readonly double[]?[] Cache = new double[]?[CacheLimit + 1];

    /// <summary>The half vector for n ≥ 3 (shared, cached: callers must not modify it).</summary>
    internal static double[] Shared(int n)
    {
        if (n > CacheLimit)
        {
            return Compute(n);
        }

        var cached = Volatile.Read(ref Cache[n]);
        if (cached is not null)
        {
            return cached;
        }

        var fresh = Compute(n);
        return Interlocked.CompareExchange(ref Cache[n], fresh, null) ?? fresh;
    }

    /// <summary>Computes the half vector a_n, a_(n−1), …, a_(n+1−⌊n/2⌋) for n ≥ 3.</summary>
    internal static double[] Compute(int n)
    {
        ArgumentOutOfRangeException.ThrowIfLessThan(n, 3);
        var half = n / 2;
        var a = new double[half];
        if (n == 3)
        {
            a[0] = Math.Sqrt(0.5);
            return a;
        }

        // Upper-half Blom scores, largest first: m[i] = −Φ⁻¹((i + 1 − 3/8)/(n + 1/4)), formed in the weights' own
        // array and scaled there (a copy of millions of scores would only be touched once)
        var m = a;
        // the scores of millions of values side by side (each depends on i only), summed in order below
        GroupChunks.ForEachRange(half, (from, to) =>
        {
            for (var i = from; i < to; i++)
            {
                m[i] = Score(i, n);
            }
        });

        var sumSquares = 0.0;
        for (var i = 0; i < half; i++)
        {
            sumSquares += m[i] * m[i];
        }

        sumSquares *= 2.0;
        var (m0, m1) = (m[0], half > 1 ? m[1] : 0.0);
        int first;
        double phi;
        if (n > 5)
        {
            (a[0], a[1], phi) = Outer(m0, m1, sumSquares, n);
            first = 2;
        }
        else
        {
            a[0] = (m0 / Math.Sqrt(sumSquares)) + Polynomial.Evaluate(Last, 1.0 / Math.Sqrt(n));
            phi = (sumSquares - (2.0 * m0 * m0)) / (1.0 - (2.0 * a[0] * a[0]));
            first = 1;
        }

        var scale = 1.0 / Math.Sqrt(phi);
        for (var i = first; i < half; i++)
        {
            a[i] = m[i] * scale;
        }

        return a;
    }

    /// <summary>Positions of the half vector scored at a time by <see cref="Numerator"/>.</summary>
    private const int ScoreChunk = 1 << 18;

    /// <summary>
    /// Σ a_i d_i over the half vector of n &gt; <see cref="CacheLimit"/> sorted values <paramref name="x"/>, for the
    /// range-scaled differences d_i = (x₍ₙ₋ᵢ₎ − x₍ᵢ₊₁₎) / <paramref name="range"/> of opposite order statistics, without
    /// storing the vector (40 MB at ten million values): the Blom scores are made a chunk at a time, side by side, and
    /// summed into Σ m² and Σ_{i≥2} m_i d_i in one pass (Neumaier's compensation); then
    /// Σ a_i d_i = a_n d_0 + a_(n−1) d_1 + Σ_{i≥2} m_i d_i / √φ with a_n, a_(n−1) and φ from <see cref="Outer"/>, as in
    /// <see cref="Compute"/>.
    /// The same sum as over the stored weights up to the rounding of that plain sum (the common factor 1/√φ is applied
    /// once, not to each weight).
    /// </summary>
    internal static double Numerator(ReadOnlySpan<double> x, double range)
    {
        var n = x.Length;
        var half = n / 2;
        var scores = new double[Math.Min(ScoreChunk, half)];
        var (squares, inner) = (default(NeumaierSum), default(NeumaierSum));
        double m0 = 0.0, m1 = 0.0;
        for (var start = 0; start < half; start += ScoreChunk)
        {
            var count = Math.Min(ScoreChunk, half - start);
            var first = start;
            GroupChunks.ForEachRange(count, (from, to) =>
            {
                for (var i = from; i < to; i++)
                {
                    scores[i] = Score(first + i, n);
                }
            });

            for (var i = 0; i < count; i++)
            {
                var m = scores[i];
                squares.Add(m * m);
                var j = start + i;
                inner.Add(j >= 2 ? m * ((x[n - 1 - j] - x[j]) / range) : 0.0);
            }

            (m0, m1) = start == 0 ? (scores[0], scores[1]) : (m0, m1);
        }

        var (a0, a1, phi) = Outer(m0, m1, 2.0 * squares.Value, n);
        return (a0 * ((x[n - 1] - x[0]) / range)) + (a1 * ((x[n - 2] - x[1]) / range)) + (inner.Value / Math.Sqrt(phi));
    }

    /// <summary>For n &gt; 5: a_n and a_(n−1) from Royston's polynomials added to m_n/√(m'm) and m_(n−1)/√(m'm), and φ, the
    /// squared length of the other scores that the other weights are divided by (√φ) to make the vector unit length.</summary>
    private static (double An, double AnMinus1, double Phi) Outer(double m0, double m1, double sumSquares, int n)
    {
        var norm = Math.Sqrt(sumSquares);
        var u = 1.0 / Math.Sqrt(n);
        var a0 = (m0 / norm) + Polynomial.Evaluate(Last, u);
        var a1 = (m1 / norm) + Polynomial.Evaluate(NextToLast, u);
        return (a0, a1, (sumSquares - (2.0 * m0 * m0) - (2.0 * m1 * m1)) / (1.0 - (2.0 * a0 * a0) - (2.0 * a1 * a1)));
    }

    /// <summary>The Blom score of the (i + 1)-th largest of n, −Φ⁻¹((i + 1 − 3/8)/(n + 1/4)).</summary>
    private static double Score(int i, int n) => -StandardNormal.Quantile((i + 1 - 0.375) / (n + 0.25));
}
