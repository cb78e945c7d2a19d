using CellCheck.Core.Data;
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
/// from <see cref="GroupedDurbinWatson"/>. G and K come from <see cref="BlockTraceSums"/> in O(n·p + cells·p²) time, memory O(cells·p).
/// </remarks>
public static class CellBlockDurbinWatson
{
    /// <param name="residuals">Residuals of the fit, in run order.</param>
    /// <param name="cell">The cell of each residual, in run order.</param>
    /// <param name="dummy">Per block factor, the block-contrast column (0 .. p − 1) of each residual in run order, or −1
    /// (<see cref="FactorColumn.Missing"/>) for the first level: codes of p levels, one byte a row below 255.</param>
    /// <returns>Null when the block contrasts are not estimable apart from the cells over these rows.</returns>
    public static DurbinWatsonResult? Test(ReadOnlySpan<double> residuals, int[] cell, int cells, LevelCodes[] dummy, int p,
        DurbinWatsonAlternative alternative = DurbinWatsonAlternative.Positive)
    {
        var n = residuals.Length;
        (double TraceMA, double TraceMA2, int Groups) traces = default;
        var tracing = Task.Run(() => traces = GroupTraces.Of(cell, cells));
        var centred = new CentredBlockColumns(cells, p);
        Span<int> columns = stackalloc int[dummy.Length];
        for (var t = 0; t < n; t++)
        {
            for (var j = 0; j < dummy.Length; j++)
            {
                columns[j] = dummy[j][t];
            }

            centred.Add(cell[t], columns, 1.0);
        }

        for (var g = 0; g < cells; g++)
        {
            centred.FinishCell(g);
        }

        var (size, mean, c) = (centred.Weight, centred.Mean, centred.C);
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

        var (gMatrix, kMatrix) = BlockTraceSums.Compute(cell, cells, dummy, p, mean, size);
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
}
