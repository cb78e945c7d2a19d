using CellCheck.Core.Cells;

namespace CellCheck.Core.Analysis;

/// <summary>The cells of the used rows brought into run order for the order checks, when the rows were sorted into
/// run order (<see cref="RunSequence"/>): the cell of every grouped position written out in order, then read at the used
/// positions in run order. (The residuals are read straight from their grouped positions in the same way, without a
/// row-ordered copy; a file in run order has its cells written directly by <see cref="RunOrdering"/>.)</summary>
internal static class RunOrderColumns
{
    /// <summary>Replaces each used grouped position in <paramref name="use"/> by its cell, in place.</summary>
    /// <param name="scratch">Working space of at least one int a grouped position, overwritten.</param>
    internal static int[] CellsInRunOrder(CellPartition partition, int[] use, int[] scratch)
    {
        partition.WriteCellOfGroupedIndex(scratch);
        for (var k = 0; k < use.Length; k++)
        {
            use[k] = scratch[use[k]];
        }

        return use;
    }
}
