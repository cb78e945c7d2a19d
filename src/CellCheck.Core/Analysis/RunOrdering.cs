using CellCheck.Core.Cells;
using CellCheck.Core.Data;
using CellCheck.Core.Statistics;

namespace CellCheck.Core.Analysis;

/// <summary>
/// Brings the residuals into run order for the order checks. When every row is used and the file is in run order
/// (logged data) and the caller wants the cells too, each residual and its cell are written straight to their row, in
/// parallel over ranges of cells, with no map between rows and grouped positions; otherwise the used rows are sorted
/// by <see cref="RunSequence"/> and the residuals gathered. The same residuals in the same order either way.
/// </summary>
internal static class RunOrdering
{
    /// <param name="leverage">Leverage of each row in grouped order; null when no row has leverage one.</param>
    /// <param name="wantsCells">True when the cell of each residual will be read (the grouped Durbin-Watson routes).</param>
    public static RunOrdered Of(RunPositions order, CellPartition partition, double[] residuals, double[]? leverage, bool wantsCells)
    {
        if (wantsCells && leverage is null && partition.RowOrder.Length == order.Length && InOrder(order, out var tied))
        {
            var e = GC.AllocateUninitializedArray<double>(order.Length);
            var cells = GC.AllocateUninitializedArray<int>(order.Length);
            var rowOrder = partition.RowOrder;
            var starts = partition.Values.Starts;
            // every row is in the partition, once: each range of cells writes its own rows
            GroupChunks.ForEach(starts, (first, end) =>
            {
                for (var c = first; c < end; c++)
                {
                    for (var i = starts[c]; i < starts[c + 1]; i++)
                    {
                        e[rowOrder[i]] = residuals[i];
                        cells[rowOrder[i]] = c;
                    }
                }
            });
            return new RunOrdered(e, order, new RunRows(null), 0, tied, null, null, cells);
        }

        var (use, rows, missing, spare) = RunSequence.UsedRows(order, partition, leverage);
        var t = rows.IsIdentity ? null : new double[use.Length];
        var gathered = new double[use.Length];
        var ties = 0;
        for (var k = 0; k < use.Length; k++)
        {
            gathered[k] = residuals[use[k]];
            if (t is not null)
            {
                t[k] = order[rows[k]];
                ties += k > 0 && t[k] == t[k - 1] ? 1 : 0;
            }
            else
            {
                ties += k > 0 && order[k] == order[k - 1] ? 1 : 0;
            }
        }

        return new RunOrdered(gathered, t is null ? order : RunPositions.Wrap(t), rows, missing, ties, use, spare, null);
    }

    /// <summary>True when the run positions are all present and never decrease; <paramref name="ties"/> counts the
    /// positions equal to the one before. Consecutive positions (held without an array) are in order and untied.</summary>
    private static bool InOrder(RunPositions order, out int ties)
    {
        ties = 0;
        if (order.IsConsecutive)
        {
            return true;
        }

        for (var k = 0; k < order.Length; k++)
        {
            if (double.IsNaN(order[k]) || (k > 0 && order[k] < order[k - 1]))
            {
                return false;
            }

            ties += k > 0 && order[k] == order[k - 1] ? 1 : 0;
        }

        return true;
    }
}
