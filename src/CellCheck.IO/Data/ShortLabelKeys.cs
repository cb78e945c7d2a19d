using System.Runtime.CompilerServices;

namespace CellCheck.IO.Data;

/// <summary>
/// The codes of labels of at most <see cref="MaxLength"/> characters, found by one 64-bit key: the UTF-16 code units
/// packed 16 bits each with the length above them, so two labels have the same key exactly when they are equal. An
/// open-addressing table (linear probing, at most half full) over Fibonacci hashing of the key (Knuth, TAOCP vol. 3,
/// §6.4) answers with one multiplication and, mostly, one comparison of integers: most factor labels in designed
/// experiments ("A", "L14", "25C") are this short, and <see cref="LabelTable"/> spends most of a lookup on
/// hashing characters and comparing them with a stored string.
/// </summary>
internal sealed class ShortLabelKeys
{
    /// <summary>Labels up to this long have a key.</summary>
    public const int MaxLength = 3;

    private ulong[] _keys = new ulong[16]; // 0 when free (every key has its length bits set)
    private int[] _codes = new int[16];
    private int _count;

    /// <summary>The key of a label of at most <see cref="MaxLength"/> characters.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)] // once per short label
    public static ulong Key(ReadOnlySpan<char> label)
    {
        var key = (ulong)(label.Length + 1) << 48;
        for (var i = 0; i < label.Length; i++)
        {
            key |= (ulong)label[i] << (16 * i);
        }

        return key;
    }

    /// <summary>The code stored for <paramref name="key"/>, or −1.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)] // once per short label
    public int Find(ulong key, out int slot)
    {
        var mask = _keys.Length - 1;
        for (slot = Slot(key, mask); ; slot = (slot + 1) & mask)
        {
            var stored = _keys[slot];
            if (stored == key)
            {
                return _codes[slot];
            }

            if (stored == 0)
            {
                return -1;
            }
        }
    }

    /// <summary>Stores <paramref name="code"/> for <paramref name="key"/> in the free slot <see cref="Find"/> gave.</summary>
    public void Add(ulong key, int code, int slot)
    {
        _keys[slot] = key;
        _codes[slot] = code;
        if (2 * ++_count > _keys.Length)
        {
            Grow();
        }
    }

    private static int Slot(ulong key, int mask) => (int)((key * 0x9E3779B97F4A7C15UL) >> 40) & mask;

    private void Grow()
    {
        var (keys, codes) = (_keys, _codes);
        _keys = new ulong[keys.Length * 2];
        _codes = new int[keys.Length * 2];
        var mask = _keys.Length - 1;
        for (var i = 0; i < keys.Length; i++)
        {
            if (keys[i] == 0)
            {
                continue;
            }

            var at = Slot(keys[i], mask);
            while (_keys[at] != 0)
            {
                at = (at + 1) & mask;
            }

            _keys[at] = keys[i];
            _codes[at] = codes[i];
        }
    }
}
