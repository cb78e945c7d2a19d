namespace CellCheck.Core.Statistics;

/// <summary>Ranks 1..n of a sample, tied values sharing the mean of the ranks they occupy (mid-ranks).</summary>
internal static class TieAveragedRanks
{
    /// <summary>Writes the mid-rank of each <paramref name="x"/>[i] into <paramref name="ranks"/>[i]. Values within
    /// <paramref name="tolerance"/> of the smallest value of a run of sorted values are tied (0: exact equality only).
    /// NaN values are not allowed.</summary>
    public static void Compute(ReadOnlySpan<double> x, Span<double> ranks, double tolerance = 0.0) => Compute(x, ranks, tolerance, null);

    /// <summary>As <see cref="Compute(ReadOnlySpan{double}, Span{double}, double)"/>, writing <paramref name="score"/> of each
    /// mid-rank instead of the rank (evaluated once per run of ties). <paramref name="ranks"/> may be the memory of
    /// <paramref name="x"/>: the values are read once, into the sort, before any rank is written.</summary>
    public static void Compute(ReadOnlySpan<double> x, Span<double> ranks, double tolerance, Func<double, double>? score)
    {
        var n = x.Length;
        var keys = RadixOrder.SortedKeys(x, out var order);
        var start = 0;
        while (start < n)
        {
            var end = start + 1;
            while (end < n && RadixSort.ValueOf(keys[end]) - RadixSort.ValueOf(keys[start]) <= tolerance)
            {
                end++;
            }

            // positions start..end-1 hold ranks start+1..end; their mean is (start + 1 + end) / 2
            var rank = 0.5 * (start + 1 + end);
            rank = score is null ? rank : score(rank);
            for (var j = start; j < end; j++)
            {
                ranks[order[j]] = rank;
            }

            start = end;
        }
    }
}
