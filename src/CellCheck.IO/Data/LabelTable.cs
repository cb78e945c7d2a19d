using System.Runtime.CompilerServices;

namespace CellCheck.IO.Data;

/// <summary>
/// The distinct labels of one column, numbered in order of first appearance, found from the characters of a cell
/// without making a string: an open-addressing hash table (linear probing, at most half full, Fibonacci hashing of a
/// 64-bit key; Knuth, TAOCP vol. 3, §6.4). A label of up to three characters is its own key (the UTF-16 code units
/// packed 16 bits each, the length above them), so it is found by comparing integers alone; a longer label's key is
/// an ordinal hash of its characters under a tag no short key has, and a key match is confirmed against the stored
/// label. Made for the per-row lookups of a factor column, where a handful to a few thousand short labels ("A",
/// "L14", "25C") repeat over millions of rows; a general dictionary spends several times as long per lookup there
/// (`intern FILE` in bench/: about 8 against 27-34 ns a label on the screen data).
/// </summary>
internal sealed class LabelTable
{
    /// <summary>Labels up to this long are their own key.</summary>
    private const int ShortLength = 3;

    /// <summary>The top 16 bits of a longer label's key (a short key holds its length + 1 ≤ 4 there).</summary>
    private const ulong LongTag = 0xFFFFUL << 48;

    private int[] _slots = new int[16]; // code + 1 of the label in each slot, 0 when free
    private ulong[] _keys = new ulong[16];
    private readonly List<string> _labels = [];

    /// <summary>The labels, by code.</summary>
    public IReadOnlyList<string> Labels => _labels;

    public int Count => _labels.Count;

    /// <summary>The code of <paramref name="label"/>, added with the next code when it is new.</summary>
    public int Intern(ReadOnlySpan<char> label)
    {
        var isShort = label.Length <= ShortLength;
        var key = isShort ? Packed(label) : LongTag | Hash(label);
        var mask = _slots.Length - 1;
        for (var at = Slot(key); ; at = (at + 1) & mask)
        {
            var slot = _slots[at];
            if (slot == 0)
            {
                return Add(label.ToString(), key, at);
            }

            if (_keys[at] == key && (isShort || label.SequenceEqual(_labels[slot - 1])))
            {
                return slot - 1;
            }
        }
    }

    private int Add(string label, ulong key, int at)
    {
        var code = _labels.Count;
        _labels.Add(label);
        _slots[at] = code + 1;
        _keys[at] = key;
        if (2 * _labels.Count > _slots.Length)
        {
            Grow();
        }

        return code;
    }

    private void Grow()
    {
        var (slots, keys) = (_slots, _keys);
        _slots = new int[slots.Length * 2];
        _keys = new ulong[slots.Length * 2];
        var mask = _slots.Length - 1;
        for (var i = 0; i < slots.Length; i++)
        {
            if (slots[i] == 0)
            {
                continue;
            }

            var at = Slot(keys[i]);
            while (_slots[at] != 0)
            {
                at = (at + 1) & mask;
            }

            _slots[at] = slots[i];
            _keys[at] = keys[i];
        }
    }

    /// <summary>The first slot to try for <paramref name="key"/>: bits 40 and up of the key times 2⁶⁴/φ (measured on the
    /// screen labels, the topmost bits alone collided about twice as often).</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)] // once per probe sequence
    private int Slot(ulong key) => (int)((key * 0x9E3779B97F4A7C15UL) >> 40) & (_slots.Length - 1);

    /// <summary>The code units of a label of at most <see cref="ShortLength"/> characters, 16 bits each, with the
    /// length + 1 above them: equal exactly when the labels are.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)] // once per short label
    private static ulong Packed(ReadOnlySpan<char> label)
    {
        var key = (ulong)(label.Length + 1) << 48;
        for (var i = 0; i < label.Length; i++)
        {
            key |= (ulong)label[i] << (16 * i);
        }

        return key;
    }

    /// <summary>FNV-1a over the UTF-16 code units (Fowler, Noll &amp; Vo); the Fibonacci slot mixes every bit.</summary>
    private static uint Hash(ReadOnlySpan<char> label)
    {
        var h = 2166136261u;
        foreach (var c in label)
        {
            h = (h ^ c) * 16777619u;
        }

        return h;
    }
}
