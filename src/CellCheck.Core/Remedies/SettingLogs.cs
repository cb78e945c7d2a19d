namespace CellCheck.Core.Remedies;

/// <summary>
/// log y in a setting order (<see cref="SettingOrder"/>), for the Box-Cox profile of the blocked model: each range of
/// positions is written from the cells it covers, each cell sorted by setting as it is read, so no order and no logs
/// of the data's length are held; any range may be written side by side with others. The first value in that order
/// that is not positive and finite is the one named in the error.
/// </summary>
internal sealed class SettingLogs<TValues>(TValues y, SettingOrder settings) : ILogSource
    where TValues : struct, IIndexedValues
{
    public int Count => settings.Count;

    public bool TryFill(int from, Span<double> target)
    {
        var cellStarts = settings.CellStarts;
        var end = from + target.Length;
        var c = Array.BinarySearch(cellStarts, from);
        c = c >= 0 ? c : ~c - 1; // the cell holding position from (an empty cell holds nothing: the last of equal starts)
        while (c + 1 < cellStarts.Length - 1 && cellStarts[c + 1] <= from)
        {
            c++;
        }

        var order = System.Buffers.ArrayPool<int>.Shared.Rent(settings.LargestCell);
        var next = System.Buffers.ArrayPool<int>.Shared.Rent(settings.LargestCell);
        try
        {
            for (; c < cellStarts.Length - 1 && cellStarts[c] < end; c++)
            {
                settings.CellOrder(c, order, next);
                var cellFrom = cellStarts[c];
                for (var p = Math.Max(from, cellFrom); p < Math.Min(end, cellStarts[c + 1]); p++)
                {
                    var v = y[order[p - cellFrom]];
                    if (!PlainLogs.Usable(v))
                    {
                        return false;
                    }

                    target[p - from] = Math.Log(v);
                }
            }

            return true;
        }
        finally
        {
            System.Buffers.ArrayPool<int>.Shared.Return(order);
            System.Buffers.ArrayPool<int>.Shared.Return(next);
        }
    }

    public ArgumentException Failure()
    {
        var order = settings.Permutation();
        var k = Array.FindIndex(order, i => !PlainLogs.Usable(y[i]));
        return PlainLogs.Refusal(order[k], y[order[k]]);
    }
}
