namespace CellCheck.Core.Statistics;

/// <summary>
/// An in-place sort of radix keys with half a copy of spare memory: each half is sorted by <see cref="RadixPasses"/>
/// through one spare buffer of half the length, then the halves are merged through the same buffer (the first half
/// copied out, merged with the second from the front; a write never overtakes the second half's reads).
/// </summary>
internal static class RadixHalves
{
    public static void Sort(Span<ulong> keys)
    {
        var half = keys.Length / 2;
        var spare = GC.AllocateUninitializedArray<ulong>(keys.Length - half);
        SortHalf(keys[..half], spare);
        SortHalf(keys[half..], spare);
        MergeHalves(keys, half, spare);
    }

    /// <summary>Sorts <paramref name="keys"/> in place through <paramref name="spare"/> (at least as long).</summary>
    private static void SortHalf(Span<ulong> keys, ulong[] spare)
    {
        if (RadixPasses.Run<WideDigit>(keys, spare, [], [], keys.Length))
        {
            spare.AsSpan(0, keys.Length).CopyTo(keys);
        }
    }

    /// <summary>Merges the sorted runs keys[..half] and keys[half..] in place: the first run is copied to
    /// <paramref name="spare"/> and merged with the second from the front (a write never overtakes the second run's reads).</summary>
    private static void MergeHalves(Span<ulong> keys, int half, ulong[] spare)
    {
        keys[..half].CopyTo(spare);
        int i = 0, j = half, k = 0;
        while (i < half && j < keys.Length)
        {
            keys[k++] = spare[i] <= keys[j] ? spare[i++] : keys[j++];
        }

        while (i < half)
        {
            keys[k++] = spare[i++];
        }
    }
}
