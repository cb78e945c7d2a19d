using CellCheck.Core.Statistics;
using MathNet.Numerics.LinearAlgebra;

namespace CellCheck.Core.Order;

/// <summary>
/// The Durbin-Watson test for residuals of cells plus additive blocks (the absorbed fit), with the exact null mean and
/// variance of d from traces that never form the n × p design matrix, and the normal approximation for p (as
/// <see cref="DurbinWatson"/> above its exact limit).
/// </summary>
/// <remarks>
/// With M_c the residual projector of the cell indicators and Z = M_c X_b the cell-centred block contrasts,
/// M = M_c − Z C⁻¹ Zᵀ with C = ZᵀZ. Writing G = ZᵀAZ and K = ZᵀA M_c A Z (p × p, accumulated row by row in run
/// order), tr(MA) = tr(M_cA) − tr(C⁻¹G) and tr((MA)²) = tr((M_cA)²) − 2 tr(C⁻¹K) + tr((C⁻¹G)²), with the cell traces
/// from <see cref="GroupedDurbinWatson"/>. Time O(n·p²), memory O(cells·p).
/// </remarks>
public static class CellBlockDurbinWatson
{
    /// <param name="residuals">Residuals of the fit, in run order.</param>
    /// <param name="cell">The cell of each residual, in run order.</param>
    /// <param name="dummy">Per block factor, the block-contrast column (0 .. p − 1) of each residual in run order, or −1 for the first level.</param>
    /// <returns>Null when the block contrasts are not estimable apart from the cells over these rows.</returns>
    public static DurbinWatsonResult? Test(ReadOnlySpan<double> residuals, int[] cell, int cells, int[][] dummy, int p,
        DurbinWatsonAlternative alternative = DurbinWatsonAlternative.Positive)
    {
        var n = residuals.Length;
        var (traceCell, traceCell2, groups) = GroupedDurbinWatson.Traces(cell, cells);
        var size = new double[cells];
        var mean = new double[cells * p];
        var c = new double[p, p];
        for (var t = 0; t < n; t++)
        {
            size[cell[t]]++;
            foreach (var column in dummy)
            {
                if (column[t] < 0)
                {
                    continue;
                }

                mean[(cell[t] * p) + column[t]]++;
                foreach (var other in dummy)
                {
                    if (other[t] >= 0)
                    {
                        c[column[t], other[t]]++;
                    }
                }
            }
        }

        for (var g = 0; g < cells; g++)
        {
            for (var a = 0; a < p && size[g] > 0; a++)
            {
                mean[(g * p) + a] /= size[g];
            }

            for (var a = 0; a < p; a++)
            {
                for (var b = 0; b < p; b++)
                {
                    c[a, b] -= size[g] * mean[(g * p) + a] * mean[(g * p) + b];
                }
            }
        }

        var cm = Matrix<double>.Build.DenseOfArray(c);
        var eigen = cm.Evd(Symmetricity.Symmetric).EigenValues.Select(v => v.Real).ToArray();
        var rank = groups + p;
        if (n < rank + 2 || !(eigen.Min() > 1e-9 * Math.Max(1.0, eigen.Max())))
        {
            return null;
        }

        var (gMatrix, kMatrix) = Accumulate(cell, cells, dummy, p, mean, size);
        var inverse = cm.Inverse();
        var cg = inverse * Matrix<double>.Build.DenseOfArray(gMatrix);
        var traceMA = traceCell - cg.Trace();
        var traceMA2 = traceCell2 - (2 * (inverse * Matrix<double>.Build.DenseOfArray(kMatrix)).Trace()) + (cg * cg).Trace();
        var nu = (double)(n - rank);
        var expected = traceMA / nu;
        var variance = GroupedDurbinWatson.Variance(traceMA, traceMA2, nu);
        var d = DurbinWatson.Statistic(residuals);
        if (double.IsNaN(d))
        {
            return new DurbinWatsonResult(d, double.NaN, expected, variance, OrderMethods.None, alternative, NotTestableReason.ZeroSpread);
        }

        var z = (d - expected) / Math.Sqrt(variance);
        var pValue = alternative switch
        {
            DurbinWatsonAlternative.Positive => StandardNormal.Cdf(z),
            DurbinWatsonAlternative.Negative => StandardNormal.UpperTail(z),
            _ => Math.Min(1.0, 2.0 * Math.Min(StandardNormal.Cdf(z), StandardNormal.UpperTail(z))),
        };
        return new DurbinWatsonResult(d, pValue, expected, variance, OrderMethods.NormalApproximation, alternative);
    }

    /// <summary>
    /// G = ZᵀAZ and K = WᵀM_cW with W = AZ, without forming Z: z_t = x_t − m_{c_t} splits every sum into a sparse part
    /// (the block indicators x) and a part in the cell means m, which is gathered per cell and multiplied out once:
    /// O(n·(B² + p)) for the run sequence plus O(cells·p²).
    /// </summary>
    private static (double[,] G, double[,] K) Accumulate(int[] cell, int cells, int[][] dummy, int p, double[] mean, double[] size)
    {
        var n = cell.Length;
        var g = new double[p, p];       // sparse parts, then the whole of G
        var k = new double[p, p];       // sparse parts, then the whole of K
        var r = new double[cells * p];  // Σ δ_t[a] per cell of the mean it meets (for Σ δμᵀ)
        var count = new double[cells];  // times each cell's mean enters μ_t
        var partner = new double[cells * p]; // Σ of the other mean in μ_t
        var r2 = new double[cells * p]; // Σ α_t[a]·coef per cell of the mean it meets (for Σ αβᵀ)
        var v = new double[cells * p];  // Σ coef·β_t per cell (for Σ ββᵀ)
        var sAlpha = new double[cells * p];
        var sBeta = new double[cells * p];
        var beta = new double[p];
        Span<int> idx = stackalloc int[3 * dummy.Length];
        Span<double> val = stackalloc double[3 * dummy.Length];
        for (var t = 0; t < n; t++)
        {
            var c = cell[t];
            if (t > 0)
            {
                // G: d_t = δ_t − μ_t with δ_t = x_t − x_{t−1}, μ_t = m_c − m_b
                var b = cell[t - 1];
                var m = 0;
                m = Put(dummy, t, 1, idx, val, m);
                m = Put(dummy, t - 1, -1, idx, val, m);
                for (var i = 0; i < m; i++)
                {
                    for (var j = 0; j < m; j++)
                    {
                        g[idx[i], idx[j]] += val[i] * val[j];
                    }

                    r[(c * p) + idx[i]] += val[i];
                    r[(b * p) + idx[i]] -= val[i];
                }

                count[c]++;
                count[b]++;
                for (var a = 0; a < p; a++)
                {
                    partner[(c * p) + a] += mean[(b * p) + a];
                    partner[(b * p) + a] += mean[(c * p) + a];
                }
            }

            // K: w_t = α_t − β_t, α_t = deg·x_t − x_{t−1} − x_{t+1}, β_t = deg·m_c − m_{c−} − m_{c+}
            var degree = (t > 0 ? 1 : 0) + (t + 1 < n ? 1 : 0);
            var terms = 0;
            terms = Put(dummy, t, degree, idx, val, terms);
            if (t > 0)
            {
                terms = Put(dummy, t - 1, -1, idx, val, terms);
            }

            if (t + 1 < n)
            {
                terms = Put(dummy, t + 1, -1, idx, val, terms);
            }

            for (var a = 0; a < p; a++)
            {
                beta[a] = (degree * mean[(c * p) + a]) - (t > 0 ? mean[(cell[t - 1] * p) + a] : 0) - (t + 1 < n ? mean[(cell[t + 1] * p) + a] : 0);
                sBeta[(c * p) + a] += beta[a];
                v[(c * p) + a] += degree * beta[a];
                if (t > 0)
                {
                    v[(cell[t - 1] * p) + a] -= beta[a];
                }

                if (t + 1 < n)
                {
                    v[(cell[t + 1] * p) + a] -= beta[a];
                }
            }

            for (var i = 0; i < terms; i++)
            {
                for (var j = 0; j < terms; j++)
                {
                    k[idx[i], idx[j]] += val[i] * val[j];
                }

                sAlpha[(c * p) + idx[i]] += val[i];
                r2[(c * p) + idx[i]] += degree * val[i];
                if (t > 0)
                {
                    r2[(cell[t - 1] * p) + idx[i]] -= val[i];
                }

                if (t + 1 < n)
                {
                    r2[(cell[t + 1] * p) + idx[i]] -= val[i];
                }
            }
        }

        for (var a = 0; a < p; a++)
        {
            for (var b = 0; b < p; b++)
            {
                double deltaMu = 0, muMu = 0, alphaBeta = 0, betaAlpha = 0, betaBeta = 0, between = 0;
                double muDelta = 0;
                for (var c = 0; c < cells; c++)
                {
                    var ma = mean[(c * p) + a];
                    var mb = mean[(c * p) + b];
                    deltaMu += r[(c * p) + a] * mb;
                    muDelta += ma * r[(c * p) + b];
                    muMu += (count[c] * ma * mb) - (ma * partner[(c * p) + b]);
                    alphaBeta += r2[(c * p) + a] * mb;
                    betaAlpha += ma * r2[(c * p) + b];
                    betaBeta += ma * v[(c * p) + b];
                    if (size[c] > 0)
                    {
                        var sa = sAlpha[(c * p) + a] - sBeta[(c * p) + a];
                        var sb = sAlpha[(c * p) + b] - sBeta[(c * p) + b];
                        between += sa * sb / size[c];
                    }
                }

                g[a, b] += muMu - deltaMu - muDelta;
                k[a, b] += betaBeta - alphaBeta - betaAlpha - between;
            }
        }

        return (g, k);
    }

    /// <summary>Appends the block indicators of position t with weight <paramref name="weight"/> to the sparse list.</summary>
    private static int Put(int[][] dummy, int t, double weight, Span<int> idx, Span<double> val, int m)
    {
        foreach (var column in dummy)
        {
            if (column[t] >= 0)
            {
                idx[m] = column[t];
                val[m++] = weight;
            }
        }

        return m;
    }
}
