using CellCheck.Core.Models;
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
/// from <see cref="GroupedDurbinWatson"/>. Time O(n·p²) (vectorised inner products over tiles of the run sequence), memory O(cells·p).
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

        if (p == 0)
        {
            return GroupedDurbinWatson.Test(residuals, cell, cells, alternative);
        }

        var cm = Matrix<double>.Build.DenseOfArray(c);
        var rank = size.Count(v => v > 0) + p;
        if (n < rank + 2 || !CellBlockFit.Estimable(cm))
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
        return GroupedDurbinWatson.Normal(residuals, expected, GroupedDurbinWatson.Variance(traceMA, traceMA2, nu), alternative);
    }

    /// <summary>G = ZᵀAZ = Σ (z_t − z_{t−1})(z_t − z_{t−1})ᵀ and K = WᵀM_cW with W = AZ, over the run sequence: each z_t
    /// formed on the fly from the cell means and the block indicators, its difference and w_t written into tiles whose
    /// column inner products are added to the two upper triangles, the sequence in two halves in parallel, added in a fixed order. (Splitting z into its sparse and
    /// cell-mean parts needs fewer operations but scatters them over every cell's accumulators, and ran slower.)</summary>
    private static (double[,] G, double[,] K) Accumulate(int[] cell, int cells, int[][] dummy, int p, double[] mean, double[] size)
    {
        var n = cell.Length;
        var halves = new (double[] G, double[] WW, double[] CellW)[2];
        Parallel.For(0, 2, h => halves[h] = Range(cell, cells, dummy, p, mean, h * n / 2, (h + 1) * n / 2));
        var g = new double[p, p];
        var k = new double[p, p];
        var cellW = halves[0].CellW;
        for (var i = 0; i < cellW.Length; i++)
        {
            cellW[i] += halves[1].CellW[i];
        }

        for (var a = 0; a < p; a++)
        {
            for (var b = 0; b < p; b++)
            {
                var between = 0.0;
                for (var c = 0; c < cells; c++)
                {
                    between += size[c] > 0 ? cellW[(c * p) + a] * cellW[(c * p) + b] / size[c] : 0;
                }

                var (lo, hi) = a <= b ? (a, b) : (b, a); // accumulated in the upper triangle
                g[a, b] = halves[0].G[(lo * p) + hi] + halves[1].G[(lo * p) + hi];
                k[a, b] = halves[0].WW[(lo * p) + hi] + halves[1].WW[(lo * p) + hi] - between;
            }
        }

        return (g, k);
    }

    /// <summary>Rows per tile: d and w are written column-wise into tiles of this many run positions, and each tile adds
    /// its p(p + 1)/2 column inner products to the upper triangles (contiguous, vectorised dot products).</summary>
    private const int Tile = 128;

    private static (double[] G, double[] WW, double[] CellW) Range(int[] cell, int cells, int[][] dummy, int p, double[] mean, int from, int to)
    {
        var n = cell.Length;
        var g = new double[p * p];
        var ww = new double[p * p];
        var cellW = new double[cells * p];
        var previous = new double[p];
        var current = new double[p];
        var next = new double[p];
        var dTile = new double[p * Tile];
        var wTile = new double[p * Tile];
        var rows = 0;
        if (from > 0)
        {
            Centred(from - 1, cell, dummy, p, mean, previous);
        }

        if (from < to)
        {
            Centred(from, cell, dummy, p, mean, current);
        }

        for (var t = from; t < to; t++)
        {
            if (t + 1 < n)
            {
                Centred(t + 1, cell, dummy, p, mean, next);
            }

            var degree = (t > 0 ? 1 : 0) + (t + 1 < n ? 1 : 0);
            var cellRow = cellW.AsSpan(cell[t] * p, p);
            for (var a = 0; a < p; a++)
            {
                var w = (degree * current[a]) - (t > 0 ? previous[a] : 0) - (t + 1 < n ? next[a] : 0);
                dTile[(a * Tile) + rows] = t > 0 ? current[a] - previous[a] : 0; // no difference at the first position
                wTile[(a * Tile) + rows] = w;
                cellRow[a] += w;
            }

            if (++rows == Tile)
            {
                AddTile(g, dTile, p, rows);
                AddTile(ww, wTile, p, rows);
                rows = 0;
            }

            (previous, current, next) = (current, next, previous);
        }

        AddTile(g, dTile, p, rows);
        AddTile(ww, wTile, p, rows);
        return (g, ww, cellW);
    }

    /// <summary>Adds the inner products of the tile's columns (the first <paramref name="rows"/> of each) to the upper triangle of acc.</summary>
    private static void AddTile(double[] acc, double[] tile, int p, int rows)
    {
        for (var a = 0; a < p; a++)
        {
            var x = tile.AsSpan(a * Tile, rows);
            for (var b = a; b < p; b++)
            {
                acc[(a * p) + b] += VectorKernels.Dot(x, tile.AsSpan(b * Tile, rows));
            }
        }
    }

    private static void Centred(int t, int[] cell, int[][] dummy, int p, double[] mean, double[] z)
    {
        for (var a = 0; a < p; a++)
        {
            z[a] = -mean[(cell[t] * p) + a];
        }

        foreach (var column in dummy)
        {
            if (column[t] >= 0)
            {
                z[column[t]] += 1;
            }
        }
    }
}
