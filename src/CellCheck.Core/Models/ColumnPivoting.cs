namespace CellCheck.Core.Models;

/// <summary>
/// Pivot choice for <see cref="PivotedQr"/> (Businger &amp; Golub 1965): the remaining column of largest norm over
/// the rows not yet reduced. Norms within a relative <see cref="TieWindow"/> of the largest are ties, resolved in
/// favour of the column that came first in X.
/// </summary>
internal static class ColumnPivoting
{
    /// <summary>Relative width of a tie: far above the rounding in a recomputed norm (about n·ε), far below any
    /// difference that matters to the rank-revealing property (a pivot within a factor 1 − 1e-10 of the largest).</summary>
    public const double TieWindow = 1e-10;

    /// <summary>Recomputes the norms of columns k..p−1 over rows k..n−1 and returns the chosen column's position.</summary>
    public static int Choose(double[] a, int n, int p, int k, int[] pivot, out double bestNorm)
    {
        Span<double> norms = p - k <= 64 ? stackalloc double[p - k] : new double[p - k];
        var max = 0.0;
        for (var j = k; j < p; j++)
        {
            var col = a.AsSpan(j * n + k, n - k);
            var ss = 0.0;
            foreach (var v in col)
            {
                ss += v * v;
            }

            norms[j - k] = Math.Sqrt(ss);
            max = Math.Max(max, norms[j - k]);
        }

        var best = -1;
        for (var j = k; j < p; j++)
        {
            if (norms[j - k] >= max * (1 - TieWindow) && (best < 0 || pivot[j] < pivot[best]))
            {
                best = j;
            }
        }

        bestNorm = best < 0 ? 0 : norms[best - k];
        return Math.Max(best, k);
    }

    /// <summary>Exchanges columns k and j of the column-major copy and their entries in <paramref name="pivot"/>.</summary>
    public static void Swap(double[] a, int n, int k, int j, int[] pivot)
    {
        if (j == k)
        {
            return;
        }

        for (var i = 0; i < n; i++)
        {
            (a[k * n + i], a[j * n + i]) = (a[j * n + i], a[k * n + i]);
        }

        (pivot[k], pivot[j]) = (pivot[j], pivot[k]);
    }
}
