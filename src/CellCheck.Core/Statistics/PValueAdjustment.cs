namespace CellCheck.Core.Statistics;

/// <summary>
/// Multiple-testing adjustment of a family of p-values.
/// Holm (1979, "A simple sequentially rejective multiple test procedure", Scand. J. Statist. 6, 65-70): with the m
/// p-values sorted ascending, p̃_(i) = min(1, max_{j ≤ i} (m − j + 1) p_(j)).
/// Benjamini &amp; Hochberg (1995, "Controlling the false discovery rate", JRSS B 57, 289-300): p̃_(i) =
/// min(1, min_{j ≥ i} m p_(j) / j). The running maximum and minimum make both monotone in the raw p-values.
/// </summary>
/// <remarks>
/// NaN entries (tests that could not be computed) are left NaN and do not count in the family size m. Tied p-values
/// receive equal adjusted values whatever their order.
/// </remarks>
public static class PValueAdjustment
{
    /// <summary>Adjusts <paramref name="p"/> by <paramref name="method"/>; the result is in the input order.</summary>
    /// <exception cref="ArgumentOutOfRangeException">A p-value that is neither NaN nor in [0, 1].</exception>
    public static double[] Adjust(ReadOnlySpan<double> p, AdjustMethod method)
    {
        var adjusted = p.ToArray();
        var m = 0;
        foreach (var v in p)
        {
            if (double.IsNaN(v))
            {
                continue;
            }

            if (v is < 0.0 or > 1.0)
            {
                throw new ArgumentOutOfRangeException(nameof(p), v, "p-values must lie in [0, 1] or be NaN.");
            }

            m++;
        }

        if (method == AdjustMethod.None || m == 0)
        {
            return adjusted;
        }

        var sorted = new double[m];
        var index = new int[m];
        var j = 0;
        for (var i = 0; i < p.Length; i++)
        {
            if (!double.IsNaN(p[i]))
            {
                sorted[j] = p[i];
                index[j] = i;
                j++;
            }
        }

        Array.Sort(sorted, index);
        switch (method)
        {
            case AdjustMethod.Holm:
                StepDown(sorted, index, adjusted);
                break;
            case AdjustMethod.BenjaminiHochberg:
                StepUp(sorted, index, adjusted);
                break;
            default:
                throw new ArgumentOutOfRangeException(nameof(method), method, "Unknown adjustment method.");
        }

        return adjusted;
    }

    private static void StepDown(double[] sorted, int[] index, double[] adjusted)
    {
        var m = sorted.Length;
        var running = 0.0;
        for (var i = 0; i < m; i++)
        {
            running = Math.Max(running, Math.Min(1.0, (m - i) * sorted[i]));
            adjusted[index[i]] = running;
        }
    }

    private static void StepUp(double[] sorted, int[] index, double[] adjusted)
    {
        var m = sorted.Length;
        var running = 1.0;
        for (var i = m - 1; i >= 0; i--)
        {
            running = Math.Min(running, (double)m / (i + 1) * sorted[i]);
            adjusted[index[i]] = running;
        }
    }
}
