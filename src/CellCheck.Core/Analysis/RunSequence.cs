using CellCheck.Core.Cells;
using CellCheck.Core.Data;

namespace CellCheck.Core.Analysis;

/// <summary>
/// The residuals that enter the order checks, in run order: positions (in the partition's grouped order) of rows
/// with a run position and leverage below one, sorted by run position, ties kept in file order, and the data rows
/// they are (so that callers read row-ordered columns in run order, sequentially when the file is in run order). Linear time when
/// the file is already in run order (logged data) or the run positions are integers over a range not much wider
/// than the row count (a stable counting sort); a comparison sort otherwise.
/// </summary>
internal static class RunSequence
{
    /// <param name="leverage">Leverage of each row in grouped order; null when no row has leverage one.</param>
    /// <returns>The grouped positions and data rows of the used rows in run order (no list of rows when every row is used
    /// in file order: run position k is data row k), the number of rows without a run position, and a working array of
    /// one int a data row that the caller may overwrite (none when every row is used in file order).</returns>
    public static (int[] Use, RunRows Rows, int Missing, int[]? Spare) UsedRows(RunPositions order, CellPartition partition, double[]? leverage)
    {
        var rows = order.Length;
        var grouped = new int[rows];
        Array.Fill(grouped, -1);
        for (var i = 0; i < partition.RowOrder.Length; i++)
        {
            grouped[partition.RowOrder[i]] = i;
        }

        var missing = 0;
        var count = 0;
        var sorted = true;
        var integral = true;
        double low = double.PositiveInfinity, high = double.NegativeInfinity, previous = double.NegativeInfinity;
        for (var r = 0; r < rows; r++)
        {
            var i = grouped[r];
            if (i < 0)
            {
                continue;
            }

            var t = order[r];
            if (double.IsNaN(t))
            {
                missing++;
                grouped[r] = -1;
                continue;
            }

            if (leverage is not null && !(leverage[i] < 1 - 1e-10))
            {
                grouped[r] = -1;
                continue;
            }

            count++;
            sorted &= t >= previous;
            previous = t;
            integral &= t == Math.Floor(t);
            low = Math.Min(low, t);
            high = Math.Max(high, t);
        }

        if (sorted && count == rows)
        {
            // every row used, in file order (logged data): the run sequence is the rows themselves, and the grouped
            // position of each row is the array just filled; nothing else is needed
            return (grouped, new RunRows(null), missing, null);
        }

        var sequence = new int[count];
        if (sorted || count == 0)
        {
            Collect(grouped, sequence);
        }
        else if (integral && high - low <= (4.0 * count) + 16)
        {
            CountingSort(order, grouped, sequence, low, (int)(high - low) + 1);
        }
        else
        {
            ComparisonSort(order, grouped, sequence);
        }

        var use = new int[count];
        for (var k = 0; k < count; k++)
        {
            use[k] = grouped[sequence[k]];
        }

        return (use, new RunRows(sequence), missing, grouped);
    }

    private static void Collect(int[] grouped, int[] rowsInOrder)
    {
        var k = 0;
        for (var r = 0; r < grouped.Length; r++)
        {
            if (grouped[r] >= 0)
            {
                rowsInOrder[k++] = r;
            }
        }
    }

    private static void CountingSort(RunPositions order, int[] grouped, int[] rowsInOrder, double low, int width)
    {
        var starts = new int[width + 1];
        for (var r = 0; r < grouped.Length; r++)
        {
            if (grouped[r] >= 0)
            {
                starts[(int)(order[r] - low) + 1]++;
            }
        }

        for (var k = 0; k < width; k++)
        {
            starts[k + 1] += starts[k];
        }

        for (var r = 0; r < grouped.Length; r++)
        {
            if (grouped[r] >= 0)
            {
                rowsInOrder[starts[(int)(order[r] - low)]++] = r;
            }
        }
    }

    private static void ComparisonSort(RunPositions order, int[] grouped, int[] rowsOf)
    {
        var keys = new double[rowsOf.Length];
        var k = 0;
        for (var r = 0; r < grouped.Length; r++)
        {
            if (grouped[r] >= 0)
            {
                keys[k] = order[r];
                rowsOf[k++] = r;
            }
        }

        Array.Sort(keys, rowsOf);
        // equal run positions keep file order
        for (var a = 0; a < keys.Length;)
        {
            var b = a + 1;
            while (b < keys.Length && keys[b] == keys[a])
            {
                b++;
            }

            if (b - a > 1)
            {
                Array.Sort(rowsOf, a, b - a);
            }

            a = b;
        }
    }
}
