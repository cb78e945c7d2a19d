namespace CellCheck.Core.Order;

/// <summary>
/// Per cell c, the sums of the neighbouring cells' mean vectors along the run sequence that
/// <see cref="BlockTraceSums"/> needs: Σ_{t∈c} m_{c(t−1)}, Σ_{t∈c} m_{c(t−2)} and Σ_{t∈c} m_{c(t+1)}.
/// </summary>
/// <remarks>
/// The three sums of a cell are kept side by side (one record of 3p values a cell), so each position writes one
/// record instead of three scattered rows, and the p-vector additions run in vector lanes (<see cref="VectorKernels.Add"/>); every element still takes
/// its terms one by one in run order, so the sums are the same doubles as a scalar loop's.
/// </remarks>
internal static class NeighbourMeans
{
    public static (double[] Back1, double[] Back2, double[] Ahead1) Sum(int[] cell, int cells, double[] mean, int p)
    {
        var n = cell.Length;
        var width = 3 * p;
        var record = new double[cells * width];
        for (var t = 0; t < n; t++)
        {
            var row = record.AsSpan(cell[t] * width, width);
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
}
