namespace CellCheck.Core.Statistics;

/// <summary>
/// The absolute deviations |y − c_g| of grouped values from their group centres in ascending order, each tagged with its
/// group instead of its position: the ranks of Fligner-Killeen's scores without an 80 MB order array at ten million
/// values. Deviations below <see cref="DeviationLayout.Low"/> (zeros first, then the rest sorted) keep their whole order-preserving key
/// (<see cref="RadixSort.KeyOf"/>) beside their group; the others are distributed over buckets of consecutive key ranges
/// (the key's leading bits above max·2⁻²⁰, about 800 buckets an octave, so a long tail does not crowd the bulk into a
/// few buckets), where each is stored as the key's bits below the bucket's with the group in the low bits, and each
/// bucket is sorted on its own (<see cref="RadixPasses"/> on byte digits, in cache). Deviations that are equal come
/// together in any group order; nothing else about the order depends on the data's layout or on the threads.
/// </summary>
internal sealed class DeviationOrder
{
    /// <summary>Octaves below the largest deviation that the buckets cover.</summary>
    private const int Octaves = 20;

    /// <summary>Bits of the bucket number (the buckets per order, at most).</summary>
    private const int BucketBits = 14;

    private readonly ulong[] _smallKeys;
    private readonly int[] _smallGroups;
    private readonly ulong[] _packed;
    private readonly int[] _bucketStarts;
    private readonly ulong _keyLow;
    private readonly int _shift;
    private readonly int _groupBits;

    private DeviationOrder(ulong[] smallKeys, int[] smallGroups, ulong[] packed, int[] bucketStarts, ulong keyLow, int shift, int groupBits)
    {
        (_smallKeys, _smallGroups, _packed, _bucketStarts) = (smallKeys, smallGroups, packed, bucketStarts);
        (_keyLow, _shift, _groupBits) = (keyLow, shift, groupBits);
    }

    /// <summary>Number of deviations.</summary>
    public int Count => _smallKeys.Length + _packed.Length;

    /// <summary>Orders the deviations of the values of <paramref name="part"/> from <paramref name="centres"/> (finite).</summary>
    /// <param name="everyKeyKept">Keep every deviation's whole key (one sort of key and group pairs; for small samples and tests).</param>
    public static DeviationOrder Sort(GroupedValues part, double[] centres, bool everyKeyKept = false)
    {
        var layout = DeviationLayout.For(part, centres, everyKeyKept, Octaves, BucketBits);
        var tally = DeviationPasses.Count(layout, part, centres);
        var (zeros, small) = (tally.Zeros.Sum(), tally.Small.Sum());
        var smallKeys = GC.AllocateUninitializedArray<ulong>(zeros + small);
        var smallGroups = GC.AllocateUninitializedArray<int>(zeros + small);
        var packed = GC.AllocateUninitializedArray<ulong>(part.Count - zeros - small);
        var bucketStarts = DeviationPasses.Scatter(layout, part, centres, tally, smallKeys, smallGroups, packed);
        smallKeys.AsSpan(zeros).Sort(smallGroups.AsSpan(zeros));
        BucketSort.Run(() => packed, bucketStarts);
        return new DeviationOrder(smallKeys, smallGroups, packed, bucketStarts, layout.KeyLow, layout.Shift, layout.GroupBits);
    }

    /// <summary>The bucket (a hint for <see cref="At"/>) that holds position <paramref name="j"/>.</summary>
    public int BucketOf(int j)
    {
        var p = j - _smallKeys.Length;
        if (p < 0)
        {
            return 0;
        }

        var found = Array.BinarySearch(_bucketStarts, p);
        var bucket = found >= 0 ? found : ~found - 1;
        while (_bucketStarts[bucket + 1] <= p)
        {
            bucket++; // past empty buckets that start at p
        }

        return bucket;
    }

    /// <summary>The deviation at position <paramref name="j"/> and its group; <paramref name="bucket"/> is a bucket at or
    /// before the position's (from <see cref="BucketOf"/> or the previous call), moved on to it.</summary>
    public double At(int j, ref int bucket, out int group)
    {
        var p = j - _smallKeys.Length;
        if (p < 0)
        {
            group = _smallGroups[j];
            return RadixSort.ValueOf(_smallKeys[j]);
        }

        while (_bucketStarts[bucket + 1] <= p)
        {
            bucket++;
        }

        var packed = _packed[p];
        group = (int)(packed & ((1UL << _groupBits) - 1));
        return RadixSort.ValueOf(_keyLow + ((ulong)bucket << _shift) + (packed >> _groupBits));
    }
}
