using CellCheck.Core.Cells;

namespace CellCheck.Core.Analysis;

/// <summary>The cells of the used rows brought into run order for the order checks. (The residuals are read straight
/// from their grouped positions in the same way, without a row-ordered copy.)</summary>
internal static class RunOrderColumns
{
    /// <summary>Replaces each used grouped position in <paramref name="use"/> by its cell, in place: when every row is used
    /// in file order, by writing each cell over its rows (run position k is data row k); otherwise by writing out the cell
    /// of every grouped position in <paramref name="scratch"/> and reading it at the used positions.</summary>
    /// <param name="scratch">Working space of at least one int a grouped position, overwritten; only read when
    /// <paramref name="rows"/> is not the identity.</param>
    internal static int[] CellsInRunOrder(CellPartition partition, int[] use, RunRows rows, int[]? scratch)
    {
        if (rows.IsIdentity)
        {
            // use[row] is the grouped position of that row; every row is used, so every entry is written once
            var rowOrder = partition.RowOrder;
            for (var c = 0; c < partition.CellCount; c++)
            {
                for (var i = partition.Values.Starts[c]; i < partition.Values.Starts[c + 1]; i++)
                {
                    use[rowOrder[i]] = c;
                }
            }

            return use;
        }

        ArgumentNullException.ThrowIfNull(scratch);
        partition.WriteCellOfGroupedIndex(scratch);
        for (var k = 0; k < use.Length; k++)
        {
            use[k] = scratch[use[k]];
        }

        return use;
    }
}
