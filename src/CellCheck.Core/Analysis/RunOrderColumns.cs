using CellCheck.Core.Cells;

namespace CellCheck.Core.Analysis;

/// <summary>Grouped-order columns brought into run order for the order checks: written out by data row first
/// (reads in order, writes scattered), then read by the rows in run order, sequentially when the file is in run order.</summary>
internal static class RunOrderColumns
{
    /// <summary>A grouped-order column written out by data row (reads in order, writes scattered: cheaper than gathering).</summary>
    internal static double[] ByRow(CellPartition partition, double[] grouped, int rows)
    {
        var result = new double[rows];
        var order = partition.RowOrder;
        for (var i = 0; i < order.Length; i++)
        {
            result[order[i]] = grouped[i];
        }

        return result;
    }

    /// <summary>The cell of each used row, in run order.</summary>
    internal static int[] CellsInRunOrder(CellPartition partition, int[] rows, int rowCount)
    {
        var cellOfRow = new int[rowCount];
        var starts = partition.Values.Starts;
        for (var c = 0; c < partition.CellCount; c++)
        {
            for (var i = starts[c]; i < starts[c + 1]; i++)
            {
                cellOfRow[partition.RowOrder[i]] = c;
            }
        }

        var result = new int[rows.Length];
        for (var k = 0; k < rows.Length; k++)
        {
            result[k] = cellOfRow[rows[k]];
        }

        return result;
    }
}
