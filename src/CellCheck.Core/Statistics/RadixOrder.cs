namespace CellCheck.Core.Statistics;

/// <summary>
/// Radix sorts that carry each value's position: least-significant-digit passes of 11 bits on the order-preserving
/// keys of <see cref="RadixSort"/> (<see cref="RadixPasses"/>: histograms from one read, a pass skipped when every
/// value shares its digit), stable, above <see cref="RadixSort.Threshold"/> values; the comparison sort below it.
/// </summary>
internal static class RadixOrder
{
    /// <summary>Sorts <paramref name="values"/> and applies the same permutation to <paramref name="payload"/> (stable).</summary>
    public static void Sort(Span<double> values, Span<int> payload)
    {
        if (values.Length < RadixSort.Threshold)
        {
            var k = values.ToArray();
            var p = payload.ToArray();
            Array.Sort(k, p);
            k.CopyTo(values);
            p.CopyTo(payload);
            return;
        }

        var keys = new ulong[values.Length];
        var spare = new ulong[values.Length];
        var carried = new int[values.Length];
        var source = new int[values.Length];
        {
            for (var i = 0; i < values.Length; i++)
            {
                keys[i] = RadixSort.KeyOf(values[i]);
            }

            payload.CopyTo(source);
            var inSpare = RadixPasses.Run<WideDigit>(keys, spare, source, carried, values.Length);
            var (sortedKeys, sortedPayload) = inSpare ? (spare, carried) : (keys, source);
            for (var i = 0; i < values.Length; i++)
            {
                values[i] = RadixSort.ValueOf(sortedKeys[i]);
            }

            sortedPayload.AsSpan(0, values.Length).CopyTo(payload);
        }
    }

    /// <summary>The order-preserving keys of <paramref name="values"/>, sorted, and in <paramref name="order"/> the index of
    /// each sorted key's value (stable above the threshold; below it, equal values may come in any order). Read a
    /// sorted value back with <see cref="RadixSort.ValueOf"/>. Allocates only the two buffers of the passes and the order.</summary>
    public static ulong[] SortedKeys(ReadOnlySpan<double> values, out int[] order)
    {
        var keys = new ulong[values.Length];
        for (var i = 0; i < keys.Length; i++)
        {
            keys[i] = RadixSort.KeyOf(values[i]);
        }

        var n = keys.Length;
        // every buffer below is written in full before it is read: no need for the allocator to clear them first
        order = GC.AllocateUninitializedArray<int>(n);
        for (var i = 0; i < n; i++)
        {
            order[i] = i;
        }

        if (n < RadixSort.Threshold)
        {
            Array.Sort(keys, order);
            return keys;
        }

        var spare = GC.AllocateUninitializedArray<ulong>(n);
        var carried = GC.AllocateUninitializedArray<int>(n);
        if (RadixPasses.Run<WideDigit>(keys, spare, order, carried, n))
        {
            order = carried;
            return spare;
        }

        return keys;
    }
}
