namespace CellCheck.Core.Statistics;

/// <summary>
/// The passes of <see cref="DeviationOrder"/> over the groups, side by side in the consecutive ranges of groups of a
/// <see cref="DeviationLayout"/>: the largest deviation, the counts of each range's deviations by place, and their
/// distribution, each range writing after the ranges before it (so the places do not depend on the threads).
/// </summary>
internal static class DeviationPasses
{
    /// <summary>The largest absolute deviation.</summary>
    public static double Largest(GroupedValues part, double[] centres, int[] ranges)
    {
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
        return largest.Max();
    }

    /// <summary>Per range of groups: each bucket's count, the zeros, and the other deviations below <see cref="DeviationLayout.Low"/>.</summary>
    public static (int[][] Counts, int[] Zeros, int[] Small) Count(DeviationLayout layout, GroupedValues part, double[] centres)
    {
        var counts = new int[layout.Ranges.Length - 1][];
        var zeros = new int[counts.Length];
        var small = new int[counts.Length];
        ForEachRange(layout.Ranges, r =>
        {
            var count = counts[r] = new int[layout.Buckets];
            var (zero, below) = (0, 0);
            var (low, keyLow, shift) = (layout.Low, layout.KeyLow, layout.Shift);
            for (var g = layout.Ranges[r]; g < layout.Ranges[r + 1]; g++)
            {
                foreach (var y in part.Group(g))
                {
                    var d = Math.Abs(y - centres[g]);
                    if (d < low)
                    {
                        zero += d == 0 ? 1 : 0;
                        below += d == 0 ? 0 : 1;
                        continue;
                    }

                    count[(int)((RadixSort.KeyOf(d) - keyLow) >> shift)]++;
                }
            }

            (zeros[r], small[r]) = (zero, below);
        });
        return (counts, zeros, small);
    }

    /// <summary>Writes every deviation to its place: zeros, then the other small ones (unsorted), in
    /// <paramref name="smallKeys"/>; bucketed ones in <paramref name="packed"/>. Returns where each bucket starts (and
    /// the end) in <paramref name="packed"/>.</summary>
    public static int[] Scatter(DeviationLayout layout, GroupedValues part, double[] centres, (int[][] Counts, int[] Zeros, int[] Small) tally,
        ulong[] smallKeys, int[] smallGroups, ulong[] packed)
    {
        var counts = tally.Counts;
        var starts = new int[layout.Buckets + 1];
        var cursors = new int[counts.Length][];
        for (var b = 0; b < layout.Buckets; b++)
        {
            var at = starts[b];
            for (var r = 0; r < counts.Length; r++)
            {
                (cursors[r] ??= new int[layout.Buckets])[b] = at;
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

        var mask = layout.Shift == 0 ? 0 : ulong.MaxValue >> (64 - layout.Shift);
        ForEachRange(layout.Ranges, r =>
        {
            var cursor = cursors[r] ?? [];
            var (zero, small) = (zeroAt[r], zeroAt[^1] + smallAt[r]);
            var (low, keyLow, shift, groupBits) = (layout.Low, layout.KeyLow, layout.Shift, layout.GroupBits);
            for (var g = layout.Ranges[r]; g < layout.Ranges[r + 1]; g++)
            {
                foreach (var y in part.Group(g))
                {
                    var d = Math.Abs(y - centres[g]);
                    var key = RadixSort.KeyOf(d);
                    if (d < low)
                    {
                        var at = d == 0 ? zero++ : small++;
                        (smallKeys[at], smallGroups[at]) = (key, g);
                        continue;
                    }

                    var offset = key - keyLow;
                    packed[cursor[(int)(offset >> shift)]++] = ((offset & mask) << groupBits) | (uint)g;
                }
            }
        });
        return starts;
    }

    /// <summary>Consecutive ranges of groups of about equal numbers of values (one range for a small sample).</summary>
    public static int[] Ranges(int[] starts)
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
