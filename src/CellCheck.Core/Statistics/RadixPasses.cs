namespace CellCheck.Core.Statistics;

/// <summary>The digit passes of <see cref="RadixSort"/>: a stable least-significant-digit radix sort of 64-bit keys
/// between two buffers, carrying an optional payload, with every pass's histogram counted in one read of the keys and
/// passes skipped where every key has the same digit.</summary>
internal static class RadixPasses
{
    /// <summary>Runs the passes between the two buffers, on digits of <typeparamref name="TDigit"/>'s width; true when the
    /// result ended in the spare buffers.</summary>
    /// <param name="payload">Values carried with the keys (empty for none), with <paramref name="carried"/> their spare buffer.</param>
    public static bool Run<TDigit>(Span<ulong> keys, Span<ulong> spare, Span<int> payload, Span<int> carried, int n)
        where TDigit : struct, IRadixDigit
    {
        var buckets = 1 << TDigit.Bits;
        var mask = (ulong)buckets - 1;
        var passes = (64 + TDigit.Bits - 1) / TDigit.Bits;
        // every pass's histogram from one read of the keys (on the stack when small)
        Span<int> counts = passes * buckets <= StackCounts ? stackalloc int[StackCounts] : new int[passes * buckets];
        counts = counts[..(passes * buckets)];
        counts.Clear();
        for (var i = 0; i < n; i++)
        {
            var key = keys[i];
            for (var pass = 0; pass < passes; pass++)
            {
                counts[(pass * buckets) + (int)((key >> (pass * TDigit.Bits)) & mask)]++;
            }
        }

        var swapped = false;
        for (var pass = 0; pass < passes; pass++)
        {
            var shift = pass * TDigit.Bits;
            var offsets = counts.Slice(pass * buckets, buckets);
            if (offsets[(int)((keys[0] >> shift) & mask)] == n)
            {
                continue; // every key has this digit
            }

            var total = 0;
            for (var d = 0; d < buckets; d++)
            {
                (offsets[d], total) = (total, total + offsets[d]);
            }

            for (var i = 0; i < n; i++)
            {
                var at = offsets[(int)((keys[i] >> shift) & mask)]++;
                spare[at] = keys[i];
                if (!payload.IsEmpty)
                {
                    carried[at] = payload[i];
                }
            }

            var written = spare;
            spare = keys;
            keys = written;
            var moved = carried;
            carried = payload;
            payload = moved;
            swapped = !swapped;
        }

        return swapped;
    }

    /// <summary>Histogram counts up to this many are kept on the stack (the byte digits' 8 × 256).</summary>
    private const int StackCounts = 2048;
}
