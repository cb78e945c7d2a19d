using CellCheck.Core.Data;

namespace CellCheck.Core.Cells;

/// <summary>
/// The stable counting sort of rows by cell behind <see cref="CellPartition"/>: cell starts, the data row of each grouped
/// position, the values and the block codes in grouped order. Large inputs are sorted in row ranges side by side, each
/// range writing from its own offset within every cell (after the ranges before it), so the layout is the one-pass
/// sort's whatever the number of ranges.
/// </summary>
internal static class CellSort
{
    /// <summary>Rows above which the counting sort runs in <see cref="Ranges"/> row ranges side by side.</summary>
    private const int ParallelRows = 1 << 20;

    private const int Ranges = 4;

    /// <param name="cellOfRow">The cell of each data row, −1 for a row that takes no part.</param>
    /// <param name="rangeCount">Row ranges to sort side by side (tests); by default one below a million rows, otherwise four.</param>
    public static (int[] Starts, int[] RowOrder, double[] Grouped, LevelCodes[] BlockCodes) Sort(int[] cellOfRow, int cellCount, double[] values, LevelCodes[] blockSource,
        int? rangeCount = null)
    {
        // a stable counting sort by cell, in row ranges side by side: each range writes from its own offset within every
        // cell (after the ranges before it), so the result is the one-pass sort's whatever the number of ranges
        var ranges = rangeCount ?? (cellOfRow.Length < ParallelRows ? 1 : Ranges);
        var offsets = new int[ranges][];
        Parallel.For(0, ranges, part =>
        {
            var counts = offsets[part] = new int[cellCount];
            foreach (var c in cellOfRow.AsSpan(RangeStart(part, ranges, cellOfRow.Length), RangeLength(part, ranges, cellOfRow.Length)))
            {
                if (c >= 0)
                {
                    counts[c]++;
                }
            }
        });
        var starts = new int[cellCount + 1];
        for (var c = 0; c < cellCount; c++)
        {
            var at = starts[c];
            for (var part = 0; part < ranges; part++)
            {
                (offsets[part][c], at) = (at, at + offsets[part][c]);
            }

            starts[c + 1] = at;
        }

        // every position is written once by the scatter below (side by side), so neither array is cleared first
        var rowOrder = GC.AllocateUninitializedArray<int>(starts[^1]);
        var grouped = GC.AllocateUninitializedArray<double>(starts[^1]);
        var blockCodes = new LevelCodes[blockSource.Length];
        for (var b = 0; b < blockSource.Length; b++)
        {
            blockCodes[b] = blockSource[b].Empty(rowOrder.Length);
        }

        // block codes in grouped order too: read in row order, written scattered (cheaper than gathering later)
        Parallel.For(0, ranges, part =>
        {
            var next = offsets[part];
            var end = RangeStart(part, ranges, cellOfRow.Length) + RangeLength(part, ranges, cellOfRow.Length);
            for (var row = RangeStart(part, ranges, cellOfRow.Length); row < end; row++)
            {
                var c = cellOfRow[row];
                if (c < 0)
                {
                    continue;
                }

                var at = next[c]++;
                rowOrder[at] = row;
                grouped[at] = values[row];
                for (var b = 0; b < blockCodes.Length; b++)
                {
                    blockCodes[b].CopyElement(at, blockSource[b], row);
                }
            }
        });

        return (starts, rowOrder, grouped, blockCodes);
    }

    private static int RangeStart(int part, int ranges, int rows) => (int)((long)rows * part / ranges);

    private static int RangeLength(int part, int ranges, int rows) => RangeStart(part + 1, ranges, rows) - RangeStart(part, ranges, rows);
}
