using System.Runtime.CompilerServices;
using CellCheck.Core.Data;

namespace CellCheck.Core.Order;

/// <summary>
/// The run-order pass of <see cref="BlockTraceSums"/> over one range of positions: the degree weights per cell, the
/// indicator parts of G and WᵀW, their cross tables by block column and cell, and the per-cell indicator sums. Every
/// term is a whole number (the weights are degrees and their products, ±1, and indicators are 0 or 1), so each sum is
/// exact and the sums of two ranges added together are the sums of the whole pass, bit for bit, whatever the cut.
/// </summary>
internal sealed class TraceAccumulator(int cells, int p)
{
    /// <summary>Σ_{t∈c} d_t.</summary>
    public double[] WeightG { get; } = new double[cells];

    /// <summary>Σ_{t∈c} (d_t² + d_t).</summary>
    public double[] WeightW { get; } = new double[cells];

    /// <summary>Weights of E_a m_cᵀ in G, by block column a and cell c.</summary>
    public double[] CrossG { get; } = new double[p * cells];

    /// <summary>Weights of E_a m_cᵀ in WᵀW.</summary>
    public double[] CrossW { get; } = new double[p * cells];

    /// <summary>Σ_{t∈c} (d_t E_t − E_{t−1} − E_{t+1}), cell c at c·p.</summary>
    public double[] Indicator { get; } = new double[cells * p];

    /// <summary>The indicator part of G.</summary>
    public double[,] EeG { get; } = new double[p, p];

    /// <summary>The indicator part of WᵀW.</summary>
    public double[,] EeW { get; } = new double[p, p];

    /// <summary>Adds positions <paramref name="from"/> to <paramref name="to"/> − 1 of the run sequence.</summary>
    public void Add(int[] cell, LevelCodes[] dummy, int from, int to)
    {
        var n = cell.Length;
        // the contrast columns of positions t − 2 .. t + 1, decoded once a position into a ring of four slots
        var m = dummy.Length;
        Span<int> ring = stackalloc int[4 * m];
        for (var s = Math.Max(0, from - 2); s <= from && s < n; s++)
        {
            TraceUpdates.Decode(dummy, s, ring.Slice((s & 3) * m, m));
        }

        for (var t = from; t < to; t++)
        {
            var c = cell[t];
            var d = Degree(t, n);
            var z = ring.Slice((t & 3) * m, m);
            if (t < n - 1)
            {
                TraceUpdates.Decode(dummy, t + 1, ring.Slice(((t + 1) & 3) * m, m));
            }

            WeightG[c] += d;
            WeightW[c] += (d * d) + d;
            TraceUpdates.Pair(z, z, c, c, d, EeG, CrossG, cells);
            TraceUpdates.Pair(z, z, c, c, (d * d) + d, EeW, CrossW, cells);
            TraceUpdates.Indicators(z, Indicator, c * p, d);
            if (t > 0)
            {
                var back = ring.Slice(((t - 1) & 3) * m, m);
                var lag = -(d + Degree(t - 1, n));
                TraceUpdates.Pair(z, back, c, cell[t - 1], -1, EeG, CrossG, cells, symmetric: true);
                TraceUpdates.Pair(z, back, c, cell[t - 1], lag, EeW, CrossW, cells, symmetric: true);
                TraceUpdates.Indicators(back, Indicator, c * p, -1);
            }

            if (t > 1)
            {
                TraceUpdates.Pair(z, ring.Slice(((t - 2) & 3) * m, m), c, cell[t - 2], 1, EeW, CrossW, cells, symmetric: true);
            }

            if (t < n - 1)
            {
                TraceUpdates.Indicators(ring.Slice(((t + 1) & 3) * m, m), Indicator, c * p, -1);
            }
        }
    }

    /// <summary>Adds the sums of <paramref name="other"/> (another range of the same sequence) to these.</summary>
    public void Merge(TraceAccumulator other)
    {
        Sum(WeightG, other.WeightG);
        Sum(WeightW, other.WeightW);
        Sum(CrossG, other.CrossG);
        Sum(CrossW, other.CrossW);
        Sum(Indicator, other.Indicator);
        for (var a = 0; a < p; a++)
        {
            for (var b = 0; b < p; b++)
            {
                EeG[a, b] += other.EeG[a, b];
                EeW[a, b] += other.EeW[a, b];
            }
        }
    }

    /// <summary>The number of neighbours of position t in a sequence of n: the degree in the difference matrix A.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)] // called several times per position
    public static int Degree(int t, int n) => (t > 0 ? 1 : 0) + (t < n - 1 ? 1 : 0);

    private static void Sum(double[] target, double[] source)
    {
        for (var i = 0; i < target.Length; i++)
        {
            target[i] += source[i];
        }
    }
}
