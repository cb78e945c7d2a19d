using System.Runtime.CompilerServices;
using System.Runtime.InteropServices;

namespace CellCheck.Core.Statistics;

/// <summary>
/// Ascending sort of doubles by radix sorting on the order-preserving bit pattern of each value (sign bit flipped for
/// positives, all bits for negatives; Knuth, TAOCP vol. 3, §5.2.5), used above <see cref="Threshold"/> values, where it
/// is several times faster than the comparison sort: the values in place through <see cref="FlagSort"/> (with their
/// positions: <see cref="RadixOrder"/>). Linear time. No NaN.
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
        if (shared is null)
        {
            var keys = MemoryMarshal.Cast<double, ulong>(values);
            ToKeys(keys);
            FlagSort.Sort(keys);
            ToValues(keys);
            return;
        }

        // each value on its own: ranges side by side
        GroupChunks.ForEachRange(values.Length, (from, to) => ToKeys(shared()[from..to]));
        FlagSort.Sort(shared);
        GroupChunks.ForEachRange(values.Length, (from, to) => ToValues(shared()[from..to]));
    }

    /// <summary>Writes each value's key over it (the value's bits read as a key).</summary>
    private static void ToKeys(Span<ulong> bits)
    {
        for (var i = 0; i < bits.Length; i++)
        {
            bits[i] = Key(BitConverter.UInt64BitsToDouble(bits[i]));
        }
    }

    private static void ToValues(Span<ulong> keys)
    {
        for (var i = 0; i < keys.Length; i++)
        {
            keys[i] = BitConverter.DoubleToUInt64Bits(Value(keys[i]));
        }
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
