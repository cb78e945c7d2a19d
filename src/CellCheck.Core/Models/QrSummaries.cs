namespace CellCheck.Core.Models;

/// <summary>Quantities derived from a <see cref="PivotedQr"/> for the fit's diagnostics and standard errors.</summary>
internal static class QrSummaries
{
    /// <summary>Leverages h_ii = Σ_k Q[i, k]² over the first Rank columns of Q (the thin Q of the kept columns).</summary>
    public static double[] Leverage(PivotedQr qr)
    {
        var h = new double[qr.Rows];
        var q = new double[qr.Rows];
        for (var c = 0; c < qr.Rank; c++)
        {
            Array.Clear(q);
            q[c] = 1;
            qr.ApplyQ(q);
            for (var i = 0; i < qr.Rows; i++)
            {
                h[i] += q[i] * q[i];
            }
        }

        return h;
    }

    /// <summary>The diagonal of (R₁₁ᵀR₁₁)⁻¹ = R₁₁⁻¹R₁₁⁻ᵀ: the squared row norms of R₁₁⁻¹, built one column at a time.</summary>
    public static double[] InverseGramDiagonal(PivotedQr qr)
    {
        var d = new double[qr.Rank];
        var w = new double[qr.Rank];
        for (var c = 0; c < qr.Rank; c++)
        {
            Array.Clear(w);
            w[c] = 1;
            for (var i = c; i >= 0; i--)
            {
                var s = w[i];
                for (var j = i + 1; j <= c; j++)
                {
                    s -= qr.R(i, j) * w[j];
                }

                w[i] = s / qr.R(i, i);
                d[i] += w[i] * w[i];
            }
        }

        return d;
    }
}
