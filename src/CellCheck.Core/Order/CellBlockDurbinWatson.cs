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
        (double TraceMA, double TraceMA2, int Groups) traces = default;
        var tracing = Task.Run(() => traces = GroupedDurbinWatson.Traces(cell, cells));
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
        var rank = size.Count(v => v > 0) + p;
        if (n < rank + 2 || !(eigen.Min() > 1e-9 * Math.Max(1.0, eigen.Max())))
        {
            return null;
        }

        var (gMatrix, kMatrix) = Accumulate(cell, cells, dummy, p, mean, size);
        tracing.Wait();
        var (traceCell, traceCell2, _) = traces;
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
        var parts = new Partial[2];
        Parallel.For(0, 2, h => parts[h] = Range(cell, cells, dummy, p, mean, h * n / 2, (h + 1) * n / 2));
        var (first, second) = (parts[0], parts[1]);
        var g = new double[p, p];
        var k = new double[p, p];
        for (var a = 0; a < p; a++)
        {
            for (var b = 0; b < p; b++)
            {
                g[a, b] = first.G[(a * p) + b] + second.G[(a * p) + b];
                k[a, b] = first.K[(a * p) + b] + second.K[(a * p) + b];
            }
        }

        var stride = Fields * p;
        for (var i = 0; i < first.Cells.Length; i++)
        {
            first.Cells[i] += second.Cells[i];
        }

        for (var c = 0; c < cells; c++)
        {
            first.Count[c] += second.Count[c];
        }

        var acc = first.Cells;
        for (var a = 0; a < p; a++)
        {
            for (var b = 0; b < p; b++)
            {
                double deltaMu = 0, muDelta = 0, muMu = 0, alphaBeta = 0, betaAlpha = 0, betaBeta = 0, between = 0;
                for (var c = 0; c < cells; c++)
                {
                    var o = c * stride;
                    var ma = mean[(c * p) + a];
                    var mb = mean[(c * p) + b];
                    deltaMu += acc[o + (R * p) + a] * mb;
                    muDelta += ma * acc[o + (R * p) + b];
                    muMu += (first.Count[c] * ma * mb) - (ma * acc[o + (Partner * p) + b]);
                    alphaBeta += acc[o + (R2 * p) + a] * mb;
                    betaAlpha += ma * acc[o + (R2 * p) + b];
                    betaBeta += ma * acc[o + (V * p) + b];
                    if (size[c] > 0)
                    {
                        var sa = acc[o + (SAlpha * p) + a] - acc[o + (SBeta * p) + a];
                        var sb = acc[o + (SAlpha * p) + b] - acc[o + (SBeta * p) + b];
                        between += sa * sb / size[c];
                    }
                }

                g[a, b] += muMu - deltaMu - muDelta;
                k[a, b] += betaBeta - alphaBeta - betaAlpha - between;
            }
        }

        return (g, k);
    }

    // per-cell accumulators, interleaved so that one cell's fields share cache lines
    private const int R = 0, Partner = 1, R2 = 2, V = 3, SAlpha = 4, SBeta = 5, Fields = 6;

    private sealed record Partial(double[] G, double[] K, double[] Cells, double[] Count);

    /// <summary>The terms of positions from .. to − 1 (neighbours are read across the range's ends).</summary>
    private static Partial Range(int[] cell, int cells, int[][] dummy, int p, double[] mean, int from, int to)
    {
        var n = cell.Length;
        var stride = Fields * p;
        var g = new double[p * p];
        var k = new double[p * p];
        var acc = new double[cells * stride];
        var count = new double[cells];
        var beta = new double[p];
        Span<int> idx = stackalloc int[3 * dummy.Length];
        Span<double> val = stackalloc double[3 * dummy.Length];
        for (var t = from; t < to; t++)
        {
            var c = cell[t];
            var oc = c * stride;
            if (t > 0)
            {
                // G: d_t = δ_t − μ_t with δ_t = x_t − x_{t−1}, μ_t = m_c − m_b
                var b = cell[t - 1];
                var ob = b * stride;
                var m = Put(dummy, t, 1, idx, val, 0);
                m = Put(dummy, t - 1, -1, idx, val, m);
                for (var i = 0; i < m; i++)
                {
                    for (var j = 0; j < m; j++)
                    {
                        g[(idx[i] * p) + idx[j]] += val[i] * val[j];
                    }

                    acc[oc + (R * p) + idx[i]] += val[i];
                    acc[ob + (R * p) + idx[i]] -= val[i];
                }

                count[c]++;
                count[b]++;
                for (var a = 0; a < p; a++)
                {
                    acc[oc + (Partner * p) + a] += mean[(b * p) + a];
                    acc[ob + (Partner * p) + a] += mean[(c * p) + a];
                }
            }

            // K: w_t = α_t − β_t, α_t = deg·x_t − x_{t−1} − x_{t+1}, β_t = deg·m_c − m_{c−} − m_{c+}
            var degree = (t > 0 ? 1 : 0) + (t + 1 < n ? 1 : 0);
            var previous = t > 0 ? cell[t - 1] * stride : -1;
            var next = t + 1 < n ? cell[t + 1] * stride : -1;
            var terms = Put(dummy, t, degree, idx, val, 0);
            terms = t > 0 ? Put(dummy, t - 1, -1, idx, val, terms) : terms;
            terms = t + 1 < n ? Put(dummy, t + 1, -1, idx, val, terms) : terms;
            for (var a = 0; a < p; a++)
            {
                beta[a] = (degree * mean[(c * p) + a]) - (t > 0 ? mean[(cell[t - 1] * p) + a] : 0) - (t + 1 < n ? mean[(cell[t + 1] * p) + a] : 0);
                acc[oc + (SBeta * p) + a] += beta[a];
                acc[oc + (V * p) + a] += degree * beta[a];
            }

            if (previous >= 0)
            {
                for (var a = 0; a < p; a++)
                {
                    acc[previous + (V * p) + a] -= beta[a];
                }
            }

            if (next >= 0)
            {
                for (var a = 0; a < p; a++)
                {
                    acc[next + (V * p) + a] -= beta[a];
                }
            }

            for (var i = 0; i < terms; i++)
            {
                for (var j = 0; j < terms; j++)
                {
                    k[(idx[i] * p) + idx[j]] += val[i] * val[j];
                }

                acc[oc + (SAlpha * p) + idx[i]] += val[i];
                acc[oc + (R2 * p) + idx[i]] += degree * val[i];
                if (previous >= 0)
                {
                    acc[previous + (R2 * p) + idx[i]] -= val[i];
                }

                if (next >= 0)
                {
                    acc[next + (R2 * p) + idx[i]] -= val[i];
                }
            }
        }

        return new Partial(g, k, acc, count);
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
