using CellCheck.Core.Data;
using CellCheck.Core.Order;

namespace CellCheck.Core.Analysis;

/// <summary>The order checks within each level of the first block factor: d, lag-1 correlation, runs and trend of that
/// block's residuals in run order.</summary>
internal static class BlockOrderChecks
{
    public static List<BlockOrderResult> Run(DesignData data, RunRows rows, double[] e, RunPositions t, double alpha)
    {
        var result = new List<BlockOrderResult>();
        var block = data.Blocks[0];
        var levels = block.Levels.Count;
        var counts = new int[levels + 1];
        var codes = block.Codes; // each used row's level, read by row in run order (twice rather than kept in a copy)
        var contiguous = true; // each level's rows in one stretch of the run sequence (days logged in order)
        var first = new int[levels];
        for (var k = 0; k < e.Length; k++)
        {
            var code = codes[rows[k]];
            contiguous &= k == 0 || code == codes[rows[k - 1]] || counts[code + 1] == 0;
            first[code] = counts[code + 1] == 0 ? k : first[code];
            counts[code + 1]++;
        }

        for (var level = 0; level < levels; level++)
        {
            counts[level + 1] += counts[level];
        }

        // a stable counting sort of the run-ordered residuals by block level keeps run order within each level;
        // when every level is one stretch already, each level is read in place
        var (eb, tb) = contiguous ? (e, t) : Sorted(e, t, rows, codes, counts);
        for (var level = 0; level < levels; level++)
        {
            var length = counts[level + 1] - counts[level];
            if (length == 0)
            {
                continue;
            }

            var from = contiguous ? first[level] : counts[level];
            var el = eb.AsSpan(from, length);
            var tl = tb.Slice(from, length);
            result.Add(new BlockOrderResult(block.Levels[level], length, length > 1 ? DurbinWatson.Statistic(el) : null,
                length > 1 ? LagCorrelation.Lag1(el) : null, OrderChecks.SignAndTrend(el, tl, alpha)));
        }

        return result;
    }

    private static (double[] E, RunPositions T) Sorted(double[] e, RunPositions t, RunRows rows, LevelCodes codes, int[] counts)
    {
        var (eb, tb) = (new double[e.Length], new double[e.Length]);
        var next = (int[])counts.Clone();
        for (var k = 0; k < e.Length; k++)
        {
            var at = next[codes[rows[k]]]++;
            eb[at] = e[k];
            tb[at] = t[k];
        }

        return (eb, RunPositions.Wrap(tb));
    }
}
