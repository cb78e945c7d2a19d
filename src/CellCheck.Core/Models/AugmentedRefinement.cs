namespace CellCheck.Core.Models;

/// <summary>
/// Iterative refinement of a least-squares solution through the augmented system [I A; Aᵀ 0][r; β] = [y; 0]
/// (Björck 1967, "Iterative refinement of linear least squares solutions I", BIT 7, 257-278): both the residual
/// vector r and β are corrected, with the system's residuals f = y − r − Aβ and g = −Aᵀr accumulated in
/// double-double (<see cref="CompensatedProducts"/>) and the correction solved with the QR factors of A:
/// h = R⁻ᵀg, d = Qᵀf, δβ = R⁻¹(d₁ − h), δr = Q[h; d₂]. Unlike refining β alone (Golub &amp; Wilkinson 1966), this
/// also removes the error that grows with κ²·‖r‖, which dominates for ill-conditioned fits with large residuals.
/// </summary>
internal static class AugmentedRefinement
{
    /// <summary>One correction of b (in the units of X, one entry per kept pivoted column) and of r (the residual
    /// vector, initially y − Xb), both in place.</summary>
    public static void Refine(PivotedQr qr, double[,] x, double[] y, int[] columns, double[] b, double[] r)
    {
        var rank = columns.Length;
        var f = new double[y.Length];
        var g = new double[rank];
        CompensatedProducts.AugmentedResidual(x, y, columns, b, r, f);
        CompensatedProducts.TransposedProduct(x, columns, r, g);
        for (var k = 0; k < rank; k++)
        {
            g[k] = -g[k] / qr.Scale[columns[k]];
        }

        qr.SolveUpperTransposed(g);
        qr.ApplyQt(f);
        for (var k = 0; k < rank; k++)
        {
            (f[k], g[k]) = (g[k], f[k] - g[k]);
        }

        qr.SolveUpper(g);
        qr.ApplyQ(f);
        for (var k = 0; k < rank; k++)
        {
            b[k] += g[k] / qr.Scale[columns[k]];
        }

        for (var i = 0; i < r.Length; i++)
        {
            r[i] += f[i];
        }
    }
}
