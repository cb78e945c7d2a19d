using CellCheck.Core.Cells;

namespace CellCheck.Core.Analysis;

/// <summary>The cells of the used rows brought into run order for the order checks: written out by data row first
/// (reads in order, writes scattered), then read by the rows in run order, sequentially when the file is in run order.
/// (The residuals are read straight from their grouped positions: one scattered read a row, without a row-ordered copy.)</summary>
internal static class RunOrderColumns
{
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
