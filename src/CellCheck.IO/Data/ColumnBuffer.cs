namespace CellCheck.IO.Data;

/// <summary>
/// An append-only column read row by row, held in chunks so that growing never copies what was read (a doubling
/// list holds up to three times its contents while it grows) and handed over as one exact array at the end. Another
/// buffer's chunks can be moved onto the end (<see cref="Append"/>) without copying them.
/// </summary>
internal sealed class ColumnBuffer<T>
{
    private const int ChunkSize = 1 << 16;
    private readonly List<T[]> _chunks = []; // the chunks before the current one
    private readonly List<int> _lengths = []; // how much of each of them is used
    private T[] _current = [];
    private int _used;

    public int Count { get; private set; }

    public void Add(T value)
    {
        if (_used == _current.Length)
        {
            Seal();
            _current = new T[ChunkSize];
        }

        _current[_used++] = value;
        Count++;
    }

    /// <summary>The last value added.</summary>
    public T Last
    {
        get => _current[_used - 1];
        set => _current[_used - 1] = value;
    }

    /// <summary>The number of runs of values the column is held in (see <see cref="Segment"/>).</summary>
    public int SegmentCount => _chunks.Count + 1;

    /// <summary>The values of one run, in column order; the last run may be empty.</summary>
    public Span<T> Segment(int index) => index < _chunks.Count ? _chunks[index].AsSpan(0, _lengths[index]) : _current.AsSpan(0, _used);

    /// <summary>Moves the values of <paramref name="next"/> after this column's (its chunks are taken over, not copied);
    /// <paramref name="next"/> is empty afterwards.</summary>
    public void Append(ColumnBuffer<T> next)
    {
        if (next.Count == 0)
        {
            return;
        }

        Seal();
        _chunks.AddRange(next._chunks);
        _lengths.AddRange(next._lengths);
        (_current, _used) = (next._current, next._used);
        Count += next.Count;
        next.Clear();
    }

    /// <summary>Copies the column into one array of exactly <see cref="Count"/> values.</summary>
    public T[] ToArray()
    {
        var result = new T[Count];
        var at = 0;
        for (var s = 0; s < SegmentCount; s++)
        {
            var segment = Segment(s);
            segment.CopyTo(result.AsSpan(at));
            at += segment.Length;
        }

        return result;
    }

    /// <summary>Copies the column into one array and releases the chunks (the column is empty afterwards).</summary>
    public T[] Detach()
    {
        var result = ToArray();
        Clear();
        return result;
    }

    /// <summary>Puts a used current chunk with the others (a new one is started at the next <see cref="Add"/>).</summary>
    private void Seal()
    {
        if (_used > 0)
        {
            _chunks.Add(_current);
            _lengths.Add(_used);
        }

        _current = [];
        _used = 0;
    }

    private void Clear()
    {
        _chunks.Clear();
        _lengths.Clear();
        _current = [];
        _used = 0;
        Count = 0;
    }
}
