using CellCheck.Core.Statistics;

namespace CellCheck.Core.Remedies;

/// <summary>
/// log y in the order of the identical-settings groups, for the Box-Cox profile of the blocked model: computed in
/// parallel over ranges of rows (each log on its own), with the same check and message as one pass in order (the
/// first value in that order that is not positive and finite is the one reported).
/// </summary>
internal static class SettingLogs
{
    /// <summary>log y[order[k]] at k.</summary>
    /// <exception cref="ArgumentException">A value is not positive and finite.</exception>
    public static double[] Of(ShiftedValues y, int[] order)
    {
        var logs = new double[order.Length];
        var failed = 0;
        GroupChunks.ForEachRange(order.Length, (from, to) =>
        {
            for (var k = from; k < to; k++)
            {
                var v = y[order[k]];
                if (!(v > 0) || !double.IsFinite(v))
                {
                    Volatile.Write(ref failed, 1);
                    return;
                }

                logs[k] = Math.Log(v);
            }
        });
        if (failed != 0)
        {
            var k = Array.FindIndex(order, i => !(y[i] > 0) || !double.IsFinite(y[i]));
            throw new ArgumentException($"Box-Cox needs positive finite values; value {order[k]} is {y[order[k]]}", nameof(y));
        }

        return logs;
    }
}
