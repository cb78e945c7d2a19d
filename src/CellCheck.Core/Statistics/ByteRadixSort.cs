using System.Buffers;

namespace CellCheck.Core.Statistics;

/// <summary>
/// Ascending sort of a medium-sized sample (<see cref="MinLength"/> up to <see cref="RadixSort.Threshold"/> values) by
/// least-significant-digit radix sort on 8-bit digits of an order-preserving bit pattern (Knuth, TAOCP vol. 3,
/// §5.2.5): positives with the sign bit set, negatives with every bit flipped, so the pattern orders as the values do
/// and maps back to the very same bits (−0 stays −0 and sorts just before +0); the passes are
/// <see cref="RadixPasses"/>' on <see cref="ByteDigit"/>s. On a thousand normal values it takes about 40% of the
/// comparison sort's time (a bench of 10 M values in samples of 256 to 4 000). A sample holding NaN is left to the
/// comparison sort.
/// </summary>
internal static class ByteRadixSort
{
    /// <summary>From this many values the radix sort beats the comparison sort (measured crossover about 130).</summary>
    public const int MinLength = 256;

    private const ulong SignBit = 0x8000_0000_0000_0000UL;

    public static void Sort(Span<double> values)
    {
        var n = values.Length;
        var keys = ArrayPool<ulong>.Shared.Rent(n);
        var spare = ArrayPool<ulong>.Shared.Rent(n);
        try
        {
            for (var i = 0; i < n; i++)
            {
                if (double.IsNaN(values[i]))
                {
                    values.Sort();
                    return;
                }

                var bits = BitConverter.DoubleToUInt64Bits(values[i]);
                keys[i] = (bits & SignBit) != 0 ? ~bits : bits | SignBit;
            }

            var sorted = RadixPasses.Run<ByteDigit>(keys.AsSpan(0, n), spare.AsSpan(0, n), [], [], n) ? spare : keys;
            for (var i = 0; i < n; i++)
            {
                var key = sorted[i];
                values[i] = BitConverter.UInt64BitsToDouble((key & SignBit) != 0 ? key & ~SignBit : ~key);
            }
        }
        finally
        {
            ArrayPool<ulong>.Shared.Return(keys);
            ArrayPool<ulong>.Shared.Return(spare);
        }
    }
}
