using CellCheck.Core.Cells;

namespace CellCheck.Core.Analysis;

/// <summary>The cells of the used rows brought into run order for the order checks: written out by data row first
/// (reads in order, writes scattered), then read by the rows in run order, sequentially when the file is in run order.
/// (The residuals are read straight from their grouped positions: one scattered read a row, without a row-ordered copy.)</summary>
internal static class RunOrderColumns
{
    /// <summary>The cell of each used row, in run order, written into <paramref name="target"/> (length: the used rows).</summary>
    /// <param name="rowMap">Working space of one int a data row, overwritten with the cell of each row.</param>
    internal static int[] CellsInRunOrder(CellPartition partition, int[] rows, int[] rowMap, int[] target)
    {
        var starts = partition.Values.Starts;
        for (var c = 0; c < partition.CellCount; c++)
        {
            for (var i = starts[c]; i < starts[c + 1]; i++)
            {
                rowMap[partition.RowOrder[i]] = c;
            }
        }

        for (var k = 0; k < rows.Length; k++)
        {
            target[k] = rowMap[rows[k]];
        }

        return target;
    }
}
