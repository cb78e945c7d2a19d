namespace CellCheck.Core.Statistics;

/// <summary>Sorts each bucket of an array of keys distributed over consecutive buckets, so that the whole array is in
/// ascending order: buckets of <see cref="ByteRadixSort.MinLength"/> keys or more by <see cref="RadixPasses"/> on byte
/// digits (a bucket of a few thousand keys stays in cache), smaller ones by the comparison sort, and a bucket of
/// <see cref="RadixSort.Threshold"/> keys or more (values crowded together) by <see cref="RadixHalves"/>. Consecutive
/// runs of buckets are sorted side by side (<see cref="Run"/>), each worker with one spare buffer.</summary>
internal static class BucketSort
{
    /// <param name="starts">Where each bucket starts in <paramref name="keys"/>, and the end.</param>
    public static void Run(KeySpan keys, int[] starts)
    {
        var buckets = starts.Length - 1;
        var bounds = GroupChunks.Bounds(starts); // buckets are groups of keys: the same ranges as the groups' work
        var longest = Longest(starts);
        if (bounds.Count == 2)
        {
            Sort(keys(), starts, 0, buckets, new ulong[longest]);
            return;
        }

        Parallel.For(0, bounds.Count - 1, () => new ulong[longest], (r, _, spare) =>
        {
            Sort(keys(), starts, bounds[r], bounds[r + 1], spare);
            return spare;
        }, _ => { });
    }

    /// <summary>Sorts buckets <paramref name="first"/> to <paramref name="end"/> − 1 one after another.</summary>
    public static void Sort(Span<ulong> keys, int[] starts, int first, int end, ulong[] spare)
    {
        for (var b = first; b < end; b++)
        {
            var bucket = keys[starts[b]..starts[b + 1]];
            if (bucket.Length < ByteRadixSort.MinLength)
            {
                bucket.Sort();
            }
            else if (bucket.Length >= RadixSort.Threshold)
            {
                RadixHalves.Sort(bucket);
            }
            else if (RadixPasses.Run<ByteDigit>(bucket, spare, [], [], bucket.Length))
            {
                spare.AsSpan(0, bucket.Length).CopyTo(bucket);
            }
        }
    }

    /// <summary>The spare buffer the byte-digit sorts need: the longest bucket below <see cref="RadixSort.Threshold"/>.</summary>
    public static int Longest(int[] starts)
    {
        var longest = 0;
        for (var b = 0; b + 1 < starts.Length; b++)
        {
            var size = starts[b + 1] - starts[b];
            longest = size < RadixSort.Threshold ? Math.Max(longest, size) : longest;
        }

        return longest;
    }
}
