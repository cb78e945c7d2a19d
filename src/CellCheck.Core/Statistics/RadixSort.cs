using System.Runtime.CompilerServices;
using System.Runtime.InteropServices;

namespace CellCheck.Core.Statistics;

/// <summary>
/// Ascending sort of doubles by radix sorting on the order-preserving bit pattern of each value (sign bit flipped for
/// positives, all bits for negatives; Knuth, TAOCP vol. 3, §5.2.5), used above <see cref="Threshold"/> values, where it
/// is several times faster than the comparison sort: the values alone in place through <see cref="FlagSort"/>; with an
/// int payload, or as keys with their order, by least-significant-digit passes of 11 bits (histograms from one read, a
/// pass skipped when every value shares its digit; stable). Linear time. No NaN.
/// </summary>
internal static class RadixSort
{
    /// <summary>Below this many values the comparison sort is used.</summary>
    public const int Threshold = 1 << 16;

    /// <summary>True when the values are already in ascending order (a sorted sample is not sorted again).</summary>
    public static bool IsAscending(ReadOnlySpan<double> values)
    {
        for (var i = 1; i < values.Length; i++)
        {
            if (values[i] < values[i - 1])
            {
                return false;
            }
        }

        return true;
    }

    public static void Sort(Span<double> values)
    {
        if (values.Length < Threshold)
        {
            if (values.Length >= ByteRadixSort.MinLength)
            {
                ByteRadixSort.Sort(values);
            }
            else
            {
                values.Sort();
            }

            return;
        }

        SortLong(values, null);
    }

    /// <summary>Sorts the first <paramref name="length"/> values of <paramref name="values"/>, a long sample's buckets side by side.</summary>
    public static void Sort(double[] values, int length)
    {
        if (length < Threshold)
        {
            Sort(values.AsSpan(0, length));
            return;
        }

        SortLong(values.AsSpan(0, length), () => MemoryMarshal.Cast<double, ulong>(values.AsSpan(0, length)));
    }

    /// <summary>The keys are written over the values themselves (each read before it is overwritten) and sorted there
    /// by <see cref="FlagSort"/>, which needs no copy; <paramref name="shared"/> gives the same keys to its workers.</summary>
    private static void SortLong(Span<double> values, KeySpan? shared)
    {
        var keys = MemoryMarshal.Cast<double, ulong>(values);
        for (var i = 0; i < values.Length; i++)
        {
            keys[i] = Key(values[i]);
        }

        if (shared is null)
        {
            FlagSort.Sort(keys);
        }
        else
        {
            FlagSort.Sort(shared);
        }

        for (var i = 0; i < values.Length; i++)
        {
            values[i] = Value(keys[i]);
        }
    }

    /// <summary>Sorts <paramref name="values"/> and applies the same permutation to <paramref name="payload"/> (stable).</summary>
    public static void Sort(Span<double> values, Span<int> payload)
    {
        if (values.Length < Threshold)
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
                keys[i] = Key(values[i]);
            }

            payload.CopyTo(source);
            var inSpare = RadixPasses.Run<WideDigit>(keys, spare, source, carried, values.Length);
            var (sortedKeys, sortedPayload) = inSpare ? (spare, carried) : (keys, source);
            for (var i = 0; i < values.Length; i++)
            {
                values[i] = Value(sortedKeys[i]);
            }

            sortedPayload.AsSpan(0, values.Length).CopyTo(payload);
        }
    }

    /// <summary>The order-preserving keys of <paramref name="values"/>, sorted, and in <paramref name="order"/> the index of
    /// each sorted key's value (stable above the threshold; below it, equal values may come in any order). Read a
    /// sorted value back with <see cref="ValueOf"/>. Allocates only the two buffers of the passes and the order.</summary>
    public static ulong[] SortedKeys(ReadOnlySpan<double> values, out int[] order)
    {
        var keys = new ulong[values.Length];
        for (var i = 0; i < keys.Length; i++)
        {
            keys[i] = Key(values[i]);
        }

        return SortKeys(keys, out order, out _);
    }

    /// <summary>As <see cref="SortedKeys(ReadOnlySpan{double}, out int[])"/> on keys already made by <see cref="KeyOf"/>:
    /// <paramref name="keys"/> serves as one of the two buffers of the passes, and <paramref name="free"/> is the other
    /// (null below the threshold), no longer needed once the sort returns.</summary>
    public static ulong[] SortKeys(ulong[] keys, out int[] order, out ulong[]? free)
    {
        var n = keys.Length;
        // every buffer below is written in full before it is read: no need for the allocator to clear them first
        order = GC.AllocateUninitializedArray<int>(n);
        for (var i = 0; i < n; i++)
        {
            order[i] = i;
        }

        if (n < Threshold)
        {
            Array.Sort(keys, order);
            free = null;
            return keys;
        }

        var spare = GC.AllocateUninitializedArray<ulong>(n);
        var carried = GC.AllocateUninitializedArray<int>(n);
        if (RadixPasses.Run<WideDigit>(keys, spare, order, carried, n))
        {
            order = carried;
            free = keys;
            return spare;
        }

        free = spare;
        return keys;
    }

    /// <summary>The order-preserving key of a value (−0 sorts with +0).</summary>
    public static ulong KeyOf(double value) => Key(value);

    /// <summary>The value of a key made by this sort.</summary>
    public static double ValueOf(ulong key) => Value(key);

    // Without branches (the signs of residuals are a coin toss, which a branch predictor cannot follow): adding +0
    // turns −0 into +0 so that it sorts with +0; then negatives have every bit flipped, positives only the sign bit.
    [MethodImpl(MethodImplOptions.AggressiveInlining)] // once per value in every sort and selection pass
    private static ulong Key(double value)
    {
        var bits = BitConverter.DoubleToInt64Bits(value + 0.0);
        return (ulong)(bits ^ ((bits >> 63) | long.MinValue));
    }

    [MethodImpl(MethodImplOptions.AggressiveInlining)] // once per value
    private static double Value(ulong key)
    {
        var bits = (long)key;
        return BitConverter.Int64BitsToDouble(bits ^ ((~bits >> 63) | long.MinValue));
    }
}
