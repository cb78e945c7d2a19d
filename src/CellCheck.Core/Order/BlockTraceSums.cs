using System.Runtime.CompilerServices;
using CellCheck.Core.Data;

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
        var weightG = new double[cells]; // Σ_{t∈c} d_t
        var weightW = new double[cells]; // Σ_{t∈c} (d_t² + d_t)
        var crossG = new double[p * cells]; // weights of E_a m_cᵀ, by block column a and cell c
        var crossW = new double[p * cells];
        var indicator = new double[cells * p]; // Σ_{t∈c} (d_t E_t − E_{t−1} − E_{t+1})
        var eeG = new double[p, p];
        var eeW = new double[p, p];
        // per cell: Σ m of the cell one step earlier, two steps earlier, one step later (a pass of its own, side by side)
        var neighbours = Task.Run(() => NeighbourMeans.Sum(cell, cells, mean, p));
        // the contrast columns of positions t − 2 .. t + 1, decoded once a position into a ring of four slots
        var m = dummy.Length;
        Span<int> ring = stackalloc int[4 * m];
        TraceUpdates.Decode(dummy, 0, ring[..m]);
        for (var t = 0; t < n; t++)
        {
            var c = cell[t];
            var d = Degree(t, n);
            var z = ring.Slice((t & 3) * m, m);
            if (t < n - 1)
            {
                TraceUpdates.Decode(dummy, t + 1, ring.Slice(((t + 1) & 3) * m, m));
            }

            weightG[c] += d;
            weightW[c] += (d * d) + d;
            TraceUpdates.Pair(z, z, c, c, d, eeG, crossG, cells);
            TraceUpdates.Pair(z, z, c, c, (d * d) + d, eeW, crossW, cells);
            TraceUpdates.Indicators(z, indicator, c * p, d);
            if (t > 0)
            {
                var back = ring.Slice(((t - 1) & 3) * m, m);
                var lag = -(d + Degree(t - 1, n));
                TraceUpdates.Pair(z, back, c, cell[t - 1], -1, eeG, crossG, cells, symmetric: true);
                TraceUpdates.Pair(z, back, c, cell[t - 1], lag, eeW, crossW, cells, symmetric: true);
                TraceUpdates.Indicators(back, indicator, c * p, -1);
            }

            if (t > 1)
            {
                TraceUpdates.Pair(z, ring.Slice(((t - 2) & 3) * m, m), c, cell[t - 2], 1, eeW, crossW, cells, symmetric: true);
            }

            if (t < n - 1)
            {
                TraceUpdates.Indicators(ring.Slice(((t + 1) & 3) * m, m), indicator, c * p, -1);
            }
        }

        var (back1, back2, ahead1) = neighbours.Result;
        // the mean-part weights of the lag-one pairs in WᵀW: −(d_t + d_{t−1}), which is −4 except next to the ends
        var laggedW = new double[cells * p];
        for (var i = 0; i < laggedW.Length; i++)
        {
            laggedW[i] = (-4 * back1[i]) + back2[i];
        }

        for (var t = 1; t < n; t = t == 1 && n > 2 ? n - 1 : n)
        {
            var extra = 4 - (Degree(t, n) + Degree(t - 1, n));
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

    [MethodImpl(MethodImplOptions.AggressiveInlining)] // called several times per position
    private static int Degree(int t, int n) => (t > 0 ? 1 : 0) + (t < n - 1 ? 1 : 0);

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
