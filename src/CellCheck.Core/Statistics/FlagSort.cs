namespace CellCheck.Core.Statistics;

/// <summary>
/// In-place ascending sort of the order-preserving keys of <see cref="RadixSort"/> without a spare copy: the keys are
/// distributed in place over buckets of their leading bits by one American flag pass (McIlroy, Bostic &amp; McIlroy
/// 1993, "Engineering radix sort", Computing Systems 6, 5-27: each bucket's unplaced keys are swapped along cycles to
/// their buckets), then each bucket is sorted on its own, in cache. The buckets follow <see cref="KeyBuckets"/>: about
/// 50 an octave over the twenty octaves below the largest magnitude, on each side of zero, and one bucket for the
/// smaller magnitudes, so long tails do not crowd the bulk of the values into a few buckets. Two thousand buckets keep
/// the places the flag pass writes to in cache (2¹³ a side took 40% longer, 2⁹ 10% longer: 10 M normal values).
/// </summary>
internal static class FlagSort
{
    /// <summary>Sorts <paramref name="keys"/> (buckets one after another).</summary>
    public static void Sort(Span<ulong> keys)
    {
        var starts = Distribute(keys);
        BucketSort.Sort(keys, starts, 0, starts.Length - 1, new ulong[BucketSort.Longest(starts)]);
    }

    /// <summary>Sorts the keys <paramref name="keys"/> gives (buckets side by side; the keys' range and the bucket
    /// counts taken over ranges of keys side by side, only the moves along the cycles on one thread).</summary>
    public static void Sort(KeySpan keys)
    {
        var all = keys();
        var ranges = (all.Length + GroupChunks.ChunkRows - 1) / GroupChunks.ChunkRows;
        var spans = new (ulong Min, ulong Max)[ranges];
        GroupChunks.ForEachRange(all.Length, (from, to) => spans[from / GroupChunks.ChunkRows] = KeyBuckets.Range(keys()[from..to]));
        var (min, max) = spans[0];
        foreach (var (low, high) in spans)
        {
            (min, max) = (Math.Min(min, low), Math.Max(max, high));
        }

        var buckets = KeyBuckets.For(min, max);
        var counts = new int[ranges][];
        GroupChunks.ForEachRange(all.Length, (from, to) => counts[from / GroupChunks.ChunkRows] = Count(keys()[from..to], buckets));
        var starts = new int[buckets.Count + 1];
        foreach (var part in counts)
        {
            for (var b = 0; b < buckets.Count; b++)
            {
                starts[b + 1] += part[b];
            }
        }

        BucketSort.Run(keys, Distribute(keys(), buckets, starts));
    }

    /// <summary>Moves every key into its bucket; returns where each bucket starts, and the end.</summary>
    private static int[] Distribute(Span<ulong> keys)
    {
        var buckets = KeyBuckets.For(keys);
        var starts = new int[buckets.Count + 1];
        var counts = Count(keys, buckets);
        for (var b = 0; b < buckets.Count; b++)
        {
            starts[b + 1] = counts[b];
        }

        return Distribute(keys, buckets, starts);
    }

    /// <summary>The number of keys in each bucket.</summary>
    private static int[] Count(ReadOnlySpan<ulong> keys, KeyBuckets buckets)
    {
        var counts = new int[buckets.Count];
        foreach (var key in keys)
        {
            counts[buckets.Of(key)]++;
        }

        return counts;
    }

    /// <summary>Moves every key into its bucket, given each bucket's count at <paramref name="starts"/>[b + 1]; returns
    /// where each bucket starts, and the end.</summary>
    private static int[] Distribute(Span<ulong> keys, KeyBuckets buckets, int[] starts)
    {
        for (var b = 0; b < buckets.Count; b++)
        {
            starts[b + 1] += starts[b];
        }

        var next = starts.AsSpan(0, buckets.Count).ToArray();
        for (var b = 0; b < buckets.Count; b++)
        {
            var end = starts[b + 1];
            while (next[b] < end)
            {
                var key = keys[next[b]];
                var home = buckets.Of(key);
                while (home != b)
                {
                    // the key goes to the next open place of its bucket; the key found there moves on
                    (key, keys[next[home]]) = (keys[next[home]], key);
                    next[home]++;
                    home = buckets.Of(key);
                }

                keys[next[b]++] = key;
            }
        }

        return starts;
    }
}
