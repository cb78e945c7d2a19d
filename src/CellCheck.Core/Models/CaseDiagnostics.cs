namespace CellCheck.Core.Models;

/// <summary>
/// Studentized residuals and Cook's distances from residuals and leverages (Belsley, Kuh &amp; Welsch 1980,
/// Regression Diagnostics, §2.1; Cook 1977, Technometrics 19, 15-18). The deleted-case variance uses the identity
/// (n − r − 1) σ̂₍ᵢ₎² = RSS − eᵢ²/(1 − hᵢᵢ), so no case is refitted.
/// </summary>
internal static class CaseDiagnostics
{
    /// <summary>Rows per parallel work item of <see cref="ComputeInParallel"/>.</summary>
    private const int Chunk = 1 << 18;

    /// <summary>As <see cref="Compute"/>, over chunks of rows side by side (each row's values depend on that row only);
    /// a null array is skipped.</summary>
    public static void ComputeInParallel(double[] e, double[] h, double rss, int df, int rank, double[]? internalT, double[]? externalT, double[]? cooks)
    {
        Parallel.For(0, (e.Length + Chunk - 1) / Chunk, k =>
        {
            var from = k * Chunk;
            var length = Math.Min(Chunk, e.Length - from);
            Compute(e.AsSpan(from, length), h.AsSpan(from, length), rss, df, rank,
                Part(internalT, from, length), Part(externalT, from, length), Part(cooks, from, length));
        });
    }

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

    private static Span<double> Part(double[]? values, int from, int length) => values is null ? [] : values.AsSpan(from, length);

    private static void Set(Span<double> target, bool write, int i, double value)
    {
        if (write)
        {
            target[i] = value;
        }
    }
}
