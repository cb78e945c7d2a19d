using CellCheck.Core.Statistics;

namespace CellCheck.Core.Remedies;

/// <summary>
/// log y in a setting order (<see cref="SettingOrder"/>), for the Box-Cox profile of the blocked model: computed in
/// parallel over ranges of cells (each log on its own, each cell sorted by setting as it is read), with the same check
/// and message as one pass in order (the first value in that order that is not positive and finite is the one reported).
/// </summary>
internal static class SettingLogs
{
    /// <summary>log y at each position of the setting order of <paramref name="settings"/>.</summary>
    /// <exception cref="ArgumentException">A value is not positive and finite.</exception>
    public static double[] Of<TValues>(TValues y, SettingOrder settings)
        where TValues : IIndexedValues
    {
        var logs = new double[settings.Count];
        var failed = 0;
        var cursor = settings.NewCursor();
        var cellStarts = settings.CellStarts;
        GroupChunks.ForEach(cellStarts, (first, end) =>
        {
            var order = new int[GroupChunks.LargestSize(cellStarts, first, end)];
            for (var c = first; c < end && Volatile.Read(ref failed) == 0; c++)
            {
                settings.CellOrder(c, cursor, order);
                var from = cellStarts[c];
                for (var k = 0; k < cellStarts[c + 1] - from; k++)
                {
                    var v = y[order[k]];
                    if (!(v > 0) || !double.IsFinite(v))
                    {
                        Volatile.Write(ref failed, 1);
                        return;
                    }

                    logs[from + k] = Math.Log(v);
                }
            }
        });
        if (failed != 0)
        {
            var order = settings.Permutation();
            var k = Array.FindIndex(order, i => !(y[i] > 0) || !double.IsFinite(y[i]));
            throw new ArgumentException($"Box-Cox needs positive finite values; value {order[k]} is {y[order[k]]}", nameof(y));
        }

        return logs;
    }
}
