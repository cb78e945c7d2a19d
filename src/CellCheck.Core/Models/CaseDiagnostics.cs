namespace CellCheck.Core.Models;

/// <summary>
/// Studentized residuals and Cook's distances from residuals and leverages (Belsley, Kuh &amp; Welsch 1980,
/// Regression Diagnostics, §2.1; Cook 1977, Technometrics 19, 15-18). The deleted-case variance uses the identity
/// (n − r − 1) σ̂₍ᵢ₎² = RSS − eᵢ²/(1 − hᵢᵢ), so no case is refitted.
/// </summary>
internal static class CaseDiagnostics
{
    /// <summary>Fills the three arrays (an empty one is skipped); rows whose leverage is exactly 1 get NaN in each.</summary>
    public static void Compute(ReadOnlySpan<double> e, ReadOnlySpan<double> h, double rss, int df, int rank,
        Span<double> internalT, Span<double> externalT, Span<double> cooks)
    {
        var sigma = df > 0 ? Math.Sqrt(rss / df) : double.NaN;
        var (writeInternal, writeExternal, writeCooks) = (!internalT.IsEmpty, !externalT.IsEmpty, !cooks.IsEmpty);
        for (var i = 0; i < e.Length; i++)
        {
            if (h[i] == 1 || !(sigma > 0))
            {
                Set(internalT, writeInternal, i, double.NaN);
                Set(externalT, writeExternal, i, double.NaN);
                Set(cooks, writeCooks, i, double.NaN);
                continue;
            }

            var oneMinusH = 1 - h[i];
            var t = e[i] / (sigma * Math.Sqrt(oneMinusH));
            Set(internalT, writeInternal, i, t);
            Set(cooks, writeCooks, i, t * t * h[i] / (rank * oneMinusH));
            if (!writeExternal)
            {
                continue;
            }

            if (df < 2)
            {
                externalT[i] = double.NaN;
                continue;
            }

            // Rounding can take the deleted sum of squares a little below 0 when row i carries nearly all of RSS.
            var deletedSs = Math.Max(0, rss - e[i] * e[i] / oneMinusH);
            externalT[i] = e[i] / (Math.Sqrt(deletedSs / (df - 1)) * Math.Sqrt(oneMinusH));
        }
    }

    private static void Set(Span<double> target, bool write, int i, double value)
    {
        if (write)
        {
            target[i] = value;
        }
    }
}
