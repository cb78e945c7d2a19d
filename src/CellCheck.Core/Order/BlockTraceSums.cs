using CellCheck.Core.Data;
using CellCheck.Core.Statistics;

namespace CellCheck.Core.Order;

/// <summary>
/// The p × p sums behind the blocked Durbin-Watson moments (see <see cref="CellBlockDurbinWatson"/>),
/// G = Σ_t (z_t − z_{t−1})(z_t − z_{t−1})ᵀ and K = WᵀM_cW with w_t = (Az)_t, for z_t = E_t − m_{c_t}: E_t the block
/// indicators of position t (its contrast columns) and m_c the mean of those indicators over cell c.
/// </summary>
/// <remarks>
/// Written with the first-difference matrix A (degree d_t = [t &gt; 0] + [t &lt; n − 1]) as
/// G = Σ d_t z_t z_tᵀ − Σ_{t≥1} (z_t z_{t−1}ᵀ + z_{t−1}z_tᵀ) and
/// WᵀW = Σ (d_t² + d_t) z_t z_tᵀ − Σ_{t≥1} (d_t + d_{t−1})(z_t z_{t−1}ᵀ + z_{t−1}z_tᵀ) + Σ_{t≥2} (z_t z_{t−2}ᵀ + z_{t−2}z_tᵀ),
/// and each product z_a z_bᵀ split into its indicator part E_aE_bᵀ (sparse), its cross part E_a m_bᵀ (a table of
/// weights by block column and cell) and its cell-mean part m_a m_bᵀ (per cell, the weighted sum of the means of the
/// cells met one and two steps earlier). One pass in run order costs O(p) per position (three vector additions)
/// instead of the O(p²) of forming every outer product; the p × p matrices are assembled over the cells at the end,
/// in O(cells·p²). Integer weights are accumulated exactly.
/// </remarks>
internal static class BlockTraceSums
{
    public static (double[,] G, double[,] K) Compute(int[] cell, int cells, LevelCodes[] dummy, int p, double[] mean, double[] size)
    {
        var n = cell.Length;
        // per cell: Σ m of the cell one step earlier, two steps earlier, one step later (a pass of its own, side by side)
        var neighbours = Task.Run(() => NeighbourMeans.Sum(cell, cells, mean, p));
        // the whole-number sums in run order, a long sequence in two ranges side by side (exact, so the same doubles)
        var parts = n <= GroupChunks.ChunkRows ? 1 : 2;
        var ranges = new TraceAccumulator[parts];
        Parallel.For(0, parts, part =>
        {
            ranges[part] = new TraceAccumulator(cells, p);
            ranges[part].Add(cell, dummy, (int)((long)n * part / parts), (int)((long)n * (part + 1) / parts));
        });
        var sums = ranges[0];
        for (var part = 1; part < parts; part++)
        {
            sums.Merge(ranges[part]);
        }

        var (weightG, weightW, crossG, crossW, indicator) = (sums.WeightG, sums.WeightW, sums.CrossG, sums.CrossW, sums.Indicator);
        var (eeG, eeW) = (sums.EeG, sums.EeW);
        var (back1, back2, ahead1) = neighbours.Result;
        // the mean-part weights of the lag-one pairs in WᵀW: −(d_t + d_{t−1}), which is −4 except next to the ends
        var laggedW = new double[cells * p];
        for (var i = 0; i < laggedW.Length; i++)
        {
            laggedW[i] = (-4 * back1[i]) + back2[i];
        }

        for (var t = 1; t < n; t = t == 1 && n > 2 ? n - 1 : n)
        {
            var extra = 4 - (TraceAccumulator.Degree(t, n) + TraceAccumulator.Degree(t - 1, n));
            for (var a = 0; a < p; a++)
            {
                laggedW[(cell[t] * p) + a] += extra * mean[(cell[t - 1] * p) + a];
            }
        }

        var g = Assemble(eeG, crossG, weightG, back1, -1, mean, cells, p);
        var ww = Assemble(eeW, crossW, weightW, laggedW, 1, mean, cells, p);
        for (var c = 0; c < cells; c++)
        {
            if (size[c] == 0)
            {
                continue;
            }

            // Σ_{t∈c} w_t = indicator part − (Σ d_t)·m_c + Σ m one step earlier + Σ m one step later
            var w = new double[p];
            for (var a = 0; a < p; a++)
            {
                var at = (c * p) + a;
                w[a] = indicator[at] - (weightG[c] * mean[at]) + back1[at] + ahead1[at];
            }

            for (var a = 0; a < p; a++)
            {
                for (var b = 0; b < p; b++)
                {
                    ww[a, b] -= w[a] * w[b] / size[c];
                }
            }
        }

        return (g, ww);
    }

    /// <summary>EE − (X + Xᵀ) + Σ_c weight_c m_c m_cᵀ + sign·(Y + Yᵀ), X[a, b] = Σ_c cross[a, c]·m_c[b], Y = Σ_c m_c lagged_cᵀ.</summary>
    private static double[,] Assemble(double[,] ee, double[] cross, double[] weight, double[] lagged, double sign, double[] mean, int cells, int p)
    {
        var result = new double[p, p];
        var x = new double[p, p];
        var y = new double[p, p];
        for (var c = 0; c < cells; c++)
        {
            var m = mean.AsSpan(c * p, p);
            var l = lagged.AsSpan(c * p, p);
            for (var a = 0; a < p; a++)
            {
                var u = cross[(a * cells) + c];
                var wm = weight[c] * m[a];
                for (var b = 0; b < p; b++)
                {
                    x[a, b] += u * m[b];
                    result[a, b] += wm * m[b];
                    y[a, b] += m[a] * l[b];
                }
            }
        }

        for (var a = 0; a < p; a++)
        {
            for (var b = 0; b < p; b++)
            {
                result[a, b] += ee[a, b] - x[a, b] - x[b, a] + (sign * (y[a, b] + y[b, a]));
            }
        }

        return result;
    }
}
