namespace CellCheck.Core.Statistics;

/// <summary>
/// The sum behind <see cref="AndersonDarling"/>'s A² on centred values in ascending order: the mean and SD, then the
/// terms (2i − 1)[log Φ(z₍ᵢ₎) + log(1 − Φ(z₍ₙ₊₁₋ᵢ₎))] taken in pairs i and n + 1 − i (each value's two log tails from
/// one erfc) and added with Neumaier's (1974) compensation. On a long sample held in an array the terms are computed
/// side by side, each pair written over its own two values, then added in the same order: the same A², bit for bit.
/// </summary>
internal static class AndersonDarlingSum
{
    /// <summary>Samples at least this long have their terms computed side by side.</summary>
    private const int SideBySide = 1 << 16;

    /// <summary>A² of the first <paramref name="n"/> values of <paramref name="x"/>, which it overwrites with the terms.</summary>
    public static double Statistic(double[] x, int n)
    {
        if (n < SideBySide)
        {
            return Statistic(x.AsSpan(0, n));
        }

        var (mean, sd) = MeanAndSd(x.AsSpan(0, n));
        var pairs = ((n - 1) / 2) + 1;
        GroupChunks.ForEachRange(pairs, (from, to) =>
        {
            for (var i = from; i < to; i++)
            {
                var j = n - 1 - i;
                var (lowerI, upperI) = StandardNormal.LogCdfBoth((x[i] - mean) / sd);
                var (lowerJ, upperJ) = j == i ? (lowerI, upperI) : StandardNormal.LogCdfBoth((x[j] - mean) / sd);
                x[i] = ((2.0 * i) + 1.0) * (lowerI + upperJ);
                if (j != i)
                {
                    x[j] = ((2.0 * j) + 1.0) * (lowerJ + upperI);
                }
            }
        });
        var sum = default(NeumaierSum);
        for (var i = 0; i < pairs; i++)
        {
            sum.Add(x[i]);
            if (n - 1 - i != i)
            {
                sum.Add(x[n - 1 - i]);
            }
        }

        return -n - (sum.Value / n);
    }

    public static double Statistic(ReadOnlySpan<double> x)
    {
        var n = x.Length;
        var (mean, sd) = MeanAndSd(x);
        var sum = default(NeumaierSum);
        // terms i and n − 1 − i together: each value's two log tails come from one erfc
        for (var i = 0; i <= (n - 1) / 2; i++)
        {
            var j = n - 1 - i;
            var (lowerI, upperI) = StandardNormal.LogCdfBoth((x[i] - mean) / sd);
            var (lowerJ, upperJ) = j == i ? (lowerI, upperI) : StandardNormal.LogCdfBoth((x[j] - mean) / sd);
            sum.Add(((2.0 * i) + 1.0) * (lowerI + upperJ));
            if (j != i)
            {
                sum.Add(((2.0 * j) + 1.0) * (lowerJ + upperI));
            }
        }

        return -n - (sum.Value / n);
    }

    /// <summary>
    /// The mean (compensated sum, refined by the compensated mean of the deviations) and the n − 1 standard deviation
    /// (compensated sum of squares about it). A² is ill-conditioned in both at large n on data far from normal: at
    /// n = 10⁶ and A² ≈ 105 an error of 1e-15 SD in the mean moves A² by about 1e-11 of itself, and Stephens' p by
    /// about 200 times as much.
    /// </summary>
    private static (double Mean, double Sd) MeanAndSd(ReadOnlySpan<double> x)
    {
        var total = default(NeumaierSum);
        foreach (var v in x)
        {
            total.Add(v);
        }

        var first = total.Value / x.Length;
        var drift = default(NeumaierSum);
        foreach (var v in x)
        {
            drift.Add(v - first);
        }

        var mean = first + (drift.Value / x.Length);
        var squares = default(NeumaierSum);
        foreach (var v in x)
        {
            squares.Add((v - mean) * (v - mean));
        }

        return (mean, Math.Sqrt(squares.Value / (x.Length - 1)));
    }
}
