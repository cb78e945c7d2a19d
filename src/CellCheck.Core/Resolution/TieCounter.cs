namespace CellCheck.Core.Resolution;

/// <summary>
/// Counts the values of a sample that equal an earlier value of the same sample (its size less its number of distinct
/// values) with an open-addressing hash set of the values' bit patterns (linear probing, at most half full, Fibonacci
/// hashing; Knuth, TAOCP vol. 3, §6.4), in linear time instead of a sort. Doubles compare equal exactly when their bits
/// are equal, except zeros of both signs (folded into +0 here) and NaN (never equal, so never counted). One counter
/// serves many samples: a slot belongs to the current sample only when its stamp is the sample's, so nothing is cleared.
/// </summary>
internal sealed class TieCounter
{
    private readonly ulong[] _keys;
    private readonly int[] _stamps;
    private readonly int _shift;
    private int _stamp;

    /// <param name="largest">The size of the largest sample to be counted.</param>
    public TieCounter(int largest)
    {
        var bits = 4;
        while ((1 << bits) < 2 * largest)
        {
            bits++;
        }

        _keys = new ulong[1 << bits];
        _stamps = new int[1 << bits];
        _shift = 64 - bits;
    }

    /// <summary>The number of values of <paramref name="sample"/> equal to an earlier one.</summary>
    public int Count(ReadOnlySpan<double> sample)
    {
        _stamp++;
        var mask = _keys.Length - 1;
        var tied = 0;
        foreach (var v in sample)
        {
            if (double.IsNaN(v))
            {
                continue;
            }

            var key = BitConverter.DoubleToUInt64Bits(v == 0.0 ? 0.0 : v);
            for (var at = (int)((key * 0x9E3779B97F4A7C15UL) >> _shift); ; at = (at + 1) & mask)
            {
                if (_stamps[at] != _stamp)
                {
                    _stamps[at] = _stamp;
                    _keys[at] = key;
                    break;
                }

                if (_keys[at] == key)
                {
                    tied++;
                    break;
                }
            }
        }

        return tied;
    }
}
