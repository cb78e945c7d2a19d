namespace CellCheck.Core.Statistics;

/// <summary>Sorts each bucket of an array of keys distributed over consecutive buckets, so that the whole array is in
/// ascending order: buckets of <see cref="ByteRadixSort.MinLength"/> keys or more by <see cref="RadixPasses"/> on byte
/// digits (a bucket of a few thousand keys stays in cache), smaller ones by the comparison sort; consecutive runs of
/// buckets side by side, each worker with one spare buffer as long as the longest bucket.</summary>
internal static class BucketSort
{
    /// <param name="starts">Where each bucket starts in <paramref name="keys"/>, and the end.</param>
    public static void Run(ulong[] keys, int[] starts)
    {
        var buckets = starts.Length - 1;
        var longest = 0;
        var bounds = new List<int> { 0 };
        for (var b = 0; b < buckets; b++)
        {
            longest = Math.Max(longest, starts[b + 1] - starts[b]);
            if (starts[b + 1] - starts[bounds[^1]] >= GroupChunks.ChunkRows && b + 1 < buckets)
            {
                bounds.Add(b + 1);
            }
        }

        bounds.Add(buckets);
        if (longest < 2)
        {
            return;
        }

        Parallel.For(0, bounds.Count - 1, () => new ulong[longest], (r, _, spare) =>
        {
            for (var b = bounds[r]; b < bounds[r + 1]; b++)
            {
                var bucket = keys.AsSpan(starts[b], starts[b + 1] - starts[b]);
                if (bucket.Length < ByteRadixSort.MinLength)
                {
                    bucket.Sort();
                }
                else if (RadixPasses.Run<ByteDigit>(bucket, spare, [], [], bucket.Length))
                {
                    spare.AsSpan(0, bucket.Length).CopyTo(bucket);
                }
            }

            return spare;
        }, _ => { });
    }
}
