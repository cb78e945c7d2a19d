namespace CellCheck.Core.Statistics;

/// <summary>The digit passes of <see cref="RadixSort"/>: a stable least-significant-digit radix sort of 64-bit keys
/// between two buffers, carrying an optional payload, with every pass's histogram counted in one read of the keys and
/// passes skipped where every key has the same digit.</summary>
internal static class RadixPasses
{
    /// <summary>Bits per digit: 2048 buckets keep every pass's scatter targets within the cache (16-bit digits, with
    /// 65 536 targets, spent most of their time in cache and TLB misses).</summary>
    private const int DigitBits = 11;

    private const int Passes64 = (64 + DigitBits - 1) / DigitBits;

    /// <summary>Runs the passes between the two buffers; true when the result ended in the spare buffers.</summary>
    /// <param name="payload">Values carried with the keys (empty for none), with <paramref name="carried"/> their spare buffer.</param>
    public static bool Run(Span<ulong> keys, Span<ulong> spare, Span<int> payload, Span<int> carried, int n)
    {
        const int buckets = 1 << DigitBits;
        const ulong mask = buckets - 1;
        // every pass's histogram from one read of the keys
        var counts = new int[Passes64 * buckets];
        for (var i = 0; i < n; i++)
        {
            var key = keys[i];
            for (var pass = 0; pass < Passes64; pass++)
            {
                counts[(pass * buckets) + (int)((key >> (pass * DigitBits)) & mask)]++;
            }
        }

        var swapped = false;
        for (var pass = 0; pass < Passes64; pass++)
        {
            var shift = pass * DigitBits;
            var offsets = counts.AsSpan(pass * buckets, buckets);
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
}
