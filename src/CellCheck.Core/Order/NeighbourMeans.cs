using CellCheck.Core.Statistics;

namespace CellCheck.Core.Order;

/// <summary>
/// Per cell c, the sums of the neighbouring cells' mean vectors along the run sequence that
/// <see cref="BlockTraceSums"/> needs: Σ_{t∈c} m_{c(t−1)}, Σ_{t∈c} m_{c(t−2)} and Σ_{t∈c} m_{c(t+1)}.
/// </summary>
/// <remarks>
/// The three sums of a cell are kept side by side (one record of 3p values a cell), so each position writes one
/// record instead of three scattered rows, and the p-vector additions run in vector lanes (<see cref="VectorKernels.Add"/>);
/// every element still takes its terms one by one in run order, so the sums are the same doubles as a scalar loop's. On a
/// sequence longer than one range of <see cref="GroupChunks.ChunkRows"/> the cells are shared out in two ranges, each
/// summed on a thread of its own over the whole sequence (a range's cells are written by that thread alone, each still
/// in run order): the same doubles again, in about half the time.
/// </remarks>
internal static class NeighbourMeans
{
    public static (double[] Back1, double[] Back2, double[] Ahead1) Sum(int[] cell, int cells, double[] mean, int p) =>
        Sum(cell, cells, mean, p, cell.Length <= GroupChunks.ChunkRows ? 1 : 2);

    /// <summary>As <see cref="Sum(int[], int, double[], int)"/>, with the cells shared out in <paramref name="parts"/>
    /// ranges: the same doubles for any number of parts.</summary>
    public static (double[] Back1, double[] Back2, double[] Ahead1) Sum(int[] cell, int cells, double[] mean, int p, int parts)
    {
        ArgumentOutOfRangeException.ThrowIfLessThan(parts, 1);
        var width = 3 * p;
        var record = new double[cells * width];
        int Bound(int part) => (int)((long)cells * part / parts);
        if (parts == 1)
        {
            AddRange(cell, 0, cells, mean, p, record);
        }
        else
        {
            Parallel.For(0, parts, part => AddRange(cell, Bound(part), Bound(part + 1), mean, p, record));
        }

        var back1 = new double[cells * p];
        var back2 = new double[cells * p];
        var ahead1 = new double[cells * p];
        for (var c = 0; c < cells; c++)
        {
            var row = record.AsSpan(c * width, width);
            row[..p].CopyTo(back1.AsSpan(c * p, p));
            row.Slice(p, p).CopyTo(back2.AsSpan(c * p, p));
            row.Slice(2 * p, p).CopyTo(ahead1.AsSpan(c * p, p));
        }

        return (back1, back2, ahead1);
    }

    /// <summary>Adds the neighbours' means of every position whose cell is in [<paramref name="low"/>, <paramref name="high"/>).</summary>
    private static void AddRange(int[] cell, int low, int high, double[] mean, int p, double[] record)
    {
        var n = cell.Length;
        var width = 3 * p;
        var span = (uint)(high - low);
        for (var t = 0; t < n; t++)
        {
            var c = cell[t];
            if ((uint)(c - low) >= span)
            {
                continue;
            }

            var row = record.AsSpan(c * width, width);
            if (t > 0)
            {
                VectorKernels.Add(row[..p], mean.AsSpan(cell[t - 1] * p, p));
            }

            if (t > 1)
            {
                VectorKernels.Add(row.Slice(p, p), mean.AsSpan(cell[t - 2] * p, p));
            }

            if (t < n - 1)
            {
                VectorKernels.Add(row.Slice(2 * p, p), mean.AsSpan(cell[t + 1] * p, p));
            }
        }
    }
}
