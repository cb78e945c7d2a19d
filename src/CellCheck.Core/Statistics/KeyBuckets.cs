using System.Numerics;

namespace CellCheck.Core.Statistics;

/// <summary>
/// Buckets of order-preserving keys (<see cref="RadixSort.KeyOf"/>), numbered in key order: keys of values at or below
/// −low in buckets of their leading bits above the smallest key, keys of magnitudes below low in one bucket, keys at or
/// above low in buckets of their leading bits above low's (or the smallest key, when that is larger). low is 2⁻²⁰ of
/// the largest magnitude, so each side spans at most twenty octaves however far its tail reaches.
/// </summary>
internal readonly struct KeyBuckets
{
    /// <summary>Octaves below the largest magnitude that the buckets of each side cover.</summary>
    private const int Octaves = 20;

    /// <summary>Bits of the bucket number on each side.</summary>
    private const int SideBits = 10;

    private readonly ulong _min;
    private readonly ulong _negativeTop;
    private readonly int _negativeShift;
    private readonly ulong _positiveBottom;
    private readonly int _positiveShift;
    private readonly int _middle;

    private KeyBuckets(ulong min, ulong negativeTop, int negativeShift, ulong positiveBottom, int positiveShift, int middle, int count)
    {
        (_min, _negativeTop, _negativeShift) = (min, negativeTop, negativeShift);
        (_positiveBottom, _positiveShift, _middle, Count) = (positiveBottom, positiveShift, middle, count);
    }

    /// <summary>Number of buckets.</summary>
    public int Count { get; }

    /// <summary>The buckets for <paramref name="keys"/> (at least one key).</summary>
    public static KeyBuckets For(ReadOnlySpan<ulong> keys)
    {
        var (min, max) = Range(keys);
        return For(min, max);
    }

    /// <summary>The smallest and largest of <paramref name="keys"/> (at least one).</summary>
    public static (ulong Min, ulong Max) Range(ReadOnlySpan<ulong> keys)
    {
        var (min, max) = (keys[0], keys[0]);
        foreach (var key in keys)
        {
            (min, max) = (Math.Min(min, key), Math.Max(max, key));
        }

        return (min, max);
    }

    /// <summary>The buckets for keys from <paramref name="min"/> to <paramref name="max"/>.</summary>
    public static KeyBuckets For(ulong min, ulong max)
    {
        var largest = Math.Max(Math.Abs(RadixSort.ValueOf(min)), Math.Abs(RadixSort.ValueOf(max)));
        var low = Math.ScaleB(largest, -Octaves);
        var negativeTop = Math.Min(RadixSort.KeyOf(-low), max);
        var positiveBottom = Math.Max(RadixSort.KeyOf(low), min);
        var (negatives, negativeShift) = min <= negativeTop && low > 0 ? Side(negativeTop - min) : (0, 0);
        var (positives, positiveShift) = positiveBottom <= max && low > 0 ? Side(max - positiveBottom) : (0, 0);
        if (low == 0)
        {
            // every value is zero: one bucket
            return new KeyBuckets(min, 0, 0, ulong.MaxValue, 0, 0, 1);
        }

        return new KeyBuckets(min, negatives == 0 ? 0 : negativeTop, negativeShift, positiveBottom, positiveShift, negatives, negatives + 1 + positives);
    }

    /// <summary>The bucket of <paramref name="key"/> (one of the keys the buckets were made for).</summary>
    public int Of(ulong key) => key <= _negativeTop && _middle > 0
        ? (int)((key - _min) >> _negativeShift)
        : key < _positiveBottom ? _middle : _middle + 1 + (int)((key - _positiveBottom) >> _positiveShift);

    private static (int Buckets, int Shift) Side(ulong span)
    {
        var shift = Math.Max(0, 64 - BitOperations.LeadingZeroCount(span) - SideBits);
        return ((int)(span >> shift) + 1, shift);
    }
}
