using System.Numerics;

namespace CellCheck.Core.Statistics;

/// <summary>
/// Where <see cref="DeviationOrder"/> puts each absolute deviation: zero, below <see cref="Low"/> (kept whole), or in
/// the bucket of its key's leading bits above <see cref="KeyLow"/>; and the counting and distributing passes over the
/// groups, side by side in consecutive ranges of groups, each range writing after the ranges before it.
/// </summary>
internal sealed class DeviationLayout
{
    /// <summary>Largest bucket number bits tried before the covered octaves shrink (a design of millions of groups).</summary>
    private const int MaxBucketBits = 20;

    private readonly int[] _ranges;

    private DeviationLayout(int[] ranges, double low, ulong keyLow, int shift, int groupBits, int buckets)
    {
        _ranges = ranges;
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

    /// <summary>The layout for the deviations of <paramref name="part"/> from <paramref name="centres"/>: buckets over
    /// <paramref name="octaves"/> octaves below the largest deviation, in up to 2^<paramref name="bucketBits"/> buckets;
    /// every deviation kept whole when <paramref name="everyKeyKept"/>.</summary>
    public static DeviationLayout For(GroupedValues part, double[] centres, bool everyKeyKept, int octaves, int bucketBits)
    {
        var ranges = Ranges(part.Starts);
        var groupBits = Math.Max(1, 32 - BitOperations.LeadingZeroCount((uint)(part.GroupCount - 1)));
        var largest = new double[ranges.Length - 1];
        ForEachRange(ranges, r =>
        {
            var max = 0.0; // a local, not largest[r]: the ranges' slots share a cache line
            for (var g = ranges[r]; g < ranges[r + 1]; g++)
            {
                foreach (var y in part.Group(g))
                {
                    max = Math.Max(max, Math.Abs(y - centres[g]));
                }
            }

            largest[r] = max;
        });
        var max = largest.Max();
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

    /// <summary>Per range of groups: each bucket's count, the zeros, and the other deviations below <see cref="Low"/>.</summary>
    public (int[][] Counts, int[] Zeros, int[] Small) Count(GroupedValues part, double[] centres)
    {
        var counts = new int[_ranges.Length - 1][];
        var zeros = new int[counts.Length];
        var small = new int[counts.Length];
        ForEachRange(_ranges, r =>
        {
            var count = counts[r] = new int[Buckets];
            var (zero, below) = (0, 0);
            for (var g = _ranges[r]; g < _ranges[r + 1]; g++)
            {
                foreach (var y in part.Group(g))
                {
                    var d = Math.Abs(y - centres[g]);
                    if (d < Low)
                    {
                        zero += d == 0 ? 1 : 0;
                        below += d == 0 ? 0 : 1;
                        continue;
                    }

                    count[(int)((RadixSort.KeyOf(d) - KeyLow) >> Shift)]++;
                }
            }

            (zeros[r], small[r]) = (zero, below);
        });
        return (counts, zeros, small);
    }

    /// <summary>Writes every deviation to its place: zeros, then the other small ones (unsorted), in
    /// <paramref name="smallKeys"/>; bucketed ones in <paramref name="packed"/>. Returns where each bucket starts (and
    /// the end) in <paramref name="packed"/>.</summary>
    public int[] Scatter(GroupedValues part, double[] centres, (int[][] Counts, int[] Zeros, int[] Small) tally, ulong[] smallKeys, int[] smallGroups, ulong[] packed)
    {
        var counts = tally.Counts;
        var starts = new int[Buckets + 1];
        var cursors = new int[counts.Length][];
        for (var b = 0; b < Buckets; b++)
        {
            var at = starts[b];
            for (var r = 0; r < counts.Length; r++)
            {
                (cursors[r] ??= new int[Buckets])[b] = at;
                at += counts[r][b];
            }

            starts[b + 1] = at;
        }

        // each range's zeros and small deviations follow those of the ranges before it
        var zeroAt = new int[counts.Length + 1];
        var smallAt = new int[counts.Length + 1];
        for (var r = 0; r < counts.Length; r++)
        {
            (zeroAt[r + 1], smallAt[r + 1]) = (zeroAt[r] + tally.Zeros[r], smallAt[r] + tally.Small[r]);
        }

        var mask = Shift == 0 ? 0 : ulong.MaxValue >> (64 - Shift);
        ForEachRange(_ranges, r =>
        {
            var cursor = cursors[r] ?? [];
            var (zero, small) = (zeroAt[r], zeroAt[^1] + smallAt[r]);
            for (var g = _ranges[r]; g < _ranges[r + 1]; g++)
            {
                foreach (var y in part.Group(g))
                {
                    var d = Math.Abs(y - centres[g]);
                    var key = RadixSort.KeyOf(d);
                    if (d < Low)
                    {
                        var at = d == 0 ? zero++ : small++;
                        (smallKeys[at], smallGroups[at]) = (key, g);
                        continue;
                    }

                    var offset = key - KeyLow;
                    packed[cursor[(int)(offset >> Shift)]++] = ((offset & mask) << GroupBits) | (uint)g;
                }
            }
        });
        return starts;
    }

    /// <summary>Consecutive ranges of groups of about equal numbers of values (one range for a small sample).</summary>
    private static int[] Ranges(int[] starts)
    {
        var groups = starts.Length - 1;
        var n = starts[^1];
        var parts = n < RadixSort.Threshold ? 1 : Math.Min(4, groups);
        var bounds = new List<int> { 0 };
        for (var g = 1; g < groups && bounds.Count < parts; g++)
        {
            if (starts[g] >= (long)n * bounds.Count / parts)
            {
                bounds.Add(g);
            }
        }

        bounds.Add(groups);
        return [.. bounds];
    }

    private static void ForEachRange(int[] ranges, Action<int> body)
    {
        if (ranges.Length == 2)
        {
            body(0);
            return;
        }

        Parallel.For(0, ranges.Length - 1, body);
    }
}
