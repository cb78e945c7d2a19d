namespace CellCheck.Core.Statistics;

/// <summary>
/// The k-th smallest value of a span by radix selection (the most-significant-digit selection of Alabi, Blanchard,
/// Gordon &amp; Steinbach, "Fast k-selection algorithms for graphics processing units", ACM Journal of Experimental
/// Algorithmics 17, 2012): each double is mapped to its <see cref="RadixSort"/> key (same order), and 16-bit digits are counted
/// from the top down, each pass over the values only counting those that share the digits found so far. At most four
/// sequential reads of the values, no copy and no reordering, so a long sample is not duplicated to find its median.
/// Exact: the result is one of the values (a zero comes back as +0, as the key counts −0 with +0). No NaN.
/// </summary>
internal static class RadixSelection
{
    private const int DigitBits = 16;

    /// <summary>The order statistics at k − 1 (NaN when k = 0) and k, 0-based.</summary>
    public static (double Lower, double Upper) SelectPair(ReadOnlySpan<double> values, int k)
    {
        var upper = Select(values, k);
        if (k == 0)
        {
            return (double.NaN, upper);
        }

        // the value below is the upper one again when at least n − k values are not below it, else the largest below
        var key = RadixSort.KeyOf(upper);
        var below = 0;
        var largestBelow = 0UL;
        foreach (var v in values)
        {
            var other = RadixSort.KeyOf(v);
            if (other < key)
            {
                below++;
                largestBelow = Math.Max(largestBelow, other);
            }
        }

        return (below < k ? upper : RadixSort.ValueOf(largestBelow), upper);
    }

    public static double Select(ReadOnlySpan<double> values, int k)
    {
        ArgumentOutOfRangeException.ThrowIfNegative(k);
        ArgumentOutOfRangeException.ThrowIfGreaterThanOrEqual(k, values.Length);
        var counts = new int[1 << DigitBits];
        var prefix = 0UL;
        for (var shift = 64 - DigitBits; shift >= 0; shift -= DigitBits)
        {
            Array.Clear(counts);
            var high = shift + DigitBits; // the digits above this one must equal the prefix found so far
            foreach (var v in values)
            {
                var key = RadixSort.KeyOf(v);
                if (high == 64 || key >> high == prefix)
                {
                    counts[(int)((key >> shift) & 0xFFFF)]++;
                }
            }

            var digit = 0;
            while (k >= counts[digit])
            {
                k -= counts[digit++];
            }

            prefix = (prefix << DigitBits) | (uint)digit;
        }

        return RadixSort.ValueOf(prefix);
    }
}
