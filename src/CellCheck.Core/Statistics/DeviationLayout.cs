using System.Numerics;

namespace CellCheck.Core.Statistics;

/// <summary>
/// Where <see cref="DeviationOrder"/> puts each absolute deviation: zero, below <see cref="Low"/> (kept whole), or in
/// the bucket of its key's leading bits above <see cref="KeyLow"/>; and the consecutive ranges of groups that
/// <see cref="DeviationPasses"/> visit side by side.
/// </summary>
internal sealed class DeviationLayout
{
    /// <summary>Largest bucket number bits tried before the covered octaves shrink (a design of millions of groups).</summary>
    private const int MaxBucketBits = 20;

    private DeviationLayout(int[] ranges, double low, ulong keyLow, int shift, int groupBits, int buckets)
    {
        Ranges = ranges;
        (Low, KeyLow, Shift, GroupBits, Buckets) = (low, keyLow, shift, groupBits, buckets);
    }

    /// <summary>Deviations below this keep their whole key.</summary>
    public double Low { get; }

    /// <summary>The key of <see cref="Low"/>, where bucket 0 starts.</summary>
    public ulong KeyLow { get; }

    /// <summary>Key bits below a bucket's: a bucket is (key − <see cref="KeyLow"/>) shifted right by this.</summary>
    public int Shift { get; }

    /// <summary>Bits of the group number beside a bucketed key's low bits.</summary>
    public int GroupBits { get; }

    /// <summary>Number of buckets.</summary>
    public int Buckets { get; }

    /// <summary>Where each range of groups starts, and the end.</summary>
    public int[] Ranges { get; }

    /// <summary>The layout for the deviations of <paramref name="part"/> from <paramref name="centres"/>: buckets over
    /// <paramref name="octaves"/> octaves below the largest deviation, in up to 2^<paramref name="bucketBits"/> buckets;
    /// every deviation kept whole when <paramref name="everyKeyKept"/>.</summary>
    public static DeviationLayout For(GroupedValues part, double[] centres, bool everyKeyKept, int octaves, int bucketBits)
    {
        var ranges = DeviationPasses.Ranges(part.Starts);
        var groupBits = Math.Max(1, 32 - BitOperations.LeadingZeroCount((uint)(part.GroupCount - 1)));
        var max = DeviationPasses.Largest(part, centres, ranges);
        if (everyKeyKept || max == 0)
        {
            return new DeviationLayout(ranges, double.PositiveInfinity, 0, 0, groupBits, 0);
        }

        for (; ; octaves--)
        {
            var low = Math.ScaleB(max, -octaves);
            var keyLow = RadixSort.KeyOf(low);
            var span = RadixSort.KeyOf(max) - keyLow;
            var width = 64 - BitOperations.LeadingZeroCount(span);
            for (var bits = bucketBits; bits <= MaxBucketBits; bits++)
            {
                var shift = Math.Max(0, width - bits);
                if (shift + groupBits <= 64)
                {
                    return new DeviationLayout(ranges, low, keyLow, shift, groupBits, (int)(span >> shift) + 1);
                }
            }
        }
    }
}
