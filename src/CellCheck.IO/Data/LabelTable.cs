namespace CellCheck.IO.Data;

/// <summary>
/// The distinct labels of one column, numbered in order of first appearance, found from the characters of a cell
/// without making a string: an open-addressing hash table (linear probing, at most half full) over an ordinal
/// multiplicative hash of every character. Made for the per-row lookups of a factor column, where a handful to a
/// few thousand short labels repeat over millions of rows; a general dictionary spends several times as long per
/// lookup there (`intern FILE` in bench/: 16 against 40 ns a label on the screen data). Labels of up to three
/// characters are first looked up by their packed characters (<see cref="ShortLabelKeys"/>).
/// </summary>
internal sealed class LabelTable
{
    private int[] _slots = new int[16]; // code + 1 of the label in each slot, 0 when free
    private uint[] _hashes = new uint[16];
    private readonly List<string> _labels = [];
    private readonly ShortLabelKeys _short = new();

    /// <summary>The labels, by code.</summary>
    public IReadOnlyList<string> Labels => _labels;

    public int Count => _labels.Count;

    /// <summary>The code of <paramref name="label"/>, added with the next code when it is new.</summary>
    public int Intern(ReadOnlySpan<char> label)
    {
        if (label.Length > ShortLabelKeys.MaxLength)
        {
            return InternAny(label);
        }

        // a short label is found by its packed characters alone
        var key = ShortLabelKeys.Key(label);
        var code = _short.Find(key, out var slot);
        if (code < 0)
        {
            code = InternAny(label);
            _short.Add(key, code, slot);
        }

        return code;
    }

    private int InternAny(ReadOnlySpan<char> label)
    {
        var hash = Hash(label);
        var mask = _slots.Length - 1;
        for (var at = (int)(hash & (uint)mask); ; at = (at + 1) & mask)
        {
            var slot = _slots[at];
            if (slot == 0)
            {
                return Add(label.ToString(), hash, at);
            }

            if (_hashes[at] == hash && label.SequenceEqual(_labels[slot - 1]))
            {
                return slot - 1;
            }
        }
    }

    private int Add(string label, uint hash, int at)
    {
        var code = _labels.Count;
        _labels.Add(label);
        _slots[at] = code + 1;
        _hashes[at] = hash;
        if (2 * _labels.Count > _slots.Length)
        {
            Grow();
        }

        return code;
    }

    private void Grow()
    {
        var (slots, hashes) = (_slots, _hashes);
        _slots = new int[slots.Length * 2];
        _hashes = new uint[slots.Length * 2];
        var mask = _slots.Length - 1;
        for (var i = 0; i < slots.Length; i++)
        {
            if (slots[i] == 0)
            {
                continue;
            }

            var at = (int)(hashes[i] & (uint)mask);
            while (_slots[at] != 0)
            {
                at = (at + 1) & mask;
            }

            _slots[at] = slots[i];
            _hashes[at] = hashes[i];
        }
    }

    /// <summary>FNV-1a over the UTF-16 code units (Fowler, Noll &amp; Vo), then the avalanche step of MurmurHash3's
    /// finaliser so that the low bits used for the slot depend on every character.</summary>
    private static uint Hash(ReadOnlySpan<char> label)
    {
        var h = 2166136261u;
        foreach (var c in label)
        {
            h = (h ^ c) * 16777619u;
        }

        h ^= h >> 16;
        h *= 0x85EBCA6Bu;
        h ^= h >> 13;
        return h;
    }
}
