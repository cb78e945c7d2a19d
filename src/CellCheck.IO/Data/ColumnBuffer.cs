namespace CellCheck.IO.Data;

/// <summary>
/// An append-only column read row by row, held in chunks so that growing never copies what was read (a doubling
/// list holds up to three times its contents while it grows) and handed over as one exact array at the end. Another
/// buffer's chunks can be moved onto the end (<see cref="Append"/>) without copying them.
/// </summary>
/// <remarks>A buffer may start in space reserved for it in a larger array (<see cref="ColumnBuffer{T}(T[], int, int)"/>):
/// the ranges of a file read on several threads write into one array sized to the file's lines, each after the lines
/// of the ranges before it, and are joined by moving each down over the unused ends before it; when the array is then full it
/// is handed over as it is. Only past its reserved space does such a buffer grow by chunks.</remarks>
internal sealed class ColumnBuffer<T>
{
    private const int ChunkSize = 1 << 16;
    private readonly List<(T[] Array, int Start, int Length)> _chunks = []; // the runs before the current one
    private T[] _current = [];
    private int _start; // where the current run starts in its array
    private int _used; // values in the current run
    private int _room; // values the current run can hold

    public ColumnBuffer()
    {
    }

    /// <summary>A buffer whose first <paramref name="room"/> values go to <paramref name="array"/> from <paramref name="start"/>.</summary>
    public ColumnBuffer(T[] array, int start, int room)
    {
        ArgumentOutOfRangeException.ThrowIfGreaterThan(start + room, array.Length);
        (_current, _start, _room) = (array, start, room);
    }

    public int Count { get; private set; }

    public void Add(T value)
    {
        if (_used == _room)
        {
            Seal();
            (_current, _start, _room) = (new T[ChunkSize], 0, ChunkSize);
        }

        _current[_start + _used++] = value;
        Count++;
    }

    /// <summary>The last value added.</summary>
    public T Last
    {
        get => _current[_start + _used - 1];
        set => _current[_start + _used - 1] = value;
    }

    /// <summary>The number of runs of values the column is held in (see <see cref="Segment"/>).</summary>
    public int SegmentCount => _chunks.Count + 1;

    /// <summary>The values of one run, in column order; the last run may be empty.</summary>
    public Span<T> Segment(int index) => index < _chunks.Count
        ? _chunks[index].Array.AsSpan(_chunks[index].Start, _chunks[index].Length)
        : _current.AsSpan(_start, _used);

    /// <summary>Moves the values of <paramref name="next"/> after this column's (its chunks are taken over, not copied;
    /// when both write into one reserved array, the next one's values are moved down to follow this one's);
    /// <paramref name="next"/> is empty afterwards.</summary>
    public void Append(ColumnBuffer<T> next)
    {
        if (next.Count == 0)
        {
            return;
        }

        if (_chunks.Count == 0 && next._chunks.Count == 0 && ReferenceEquals(_current, next._current) && next._start >= _start + _used)
        {
            if (next._start != _start + _used)
            {
                Array.Copy(_current, next._start, _current, _start + _used, next._used);
            }

            _used += next._used;
            _room = _used; // the rest of the array may hold nothing more of this column
        }
        else
        {
            Seal();
            _chunks.AddRange(next._chunks);
            (_current, _start, _used, _room) = (next._current, next._start, next._used, next._room);
        }

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

    /// <summary>The column as one array (the reserved array itself when the column fills it exactly, else a copy), with
    /// the chunks released (the column is empty afterwards).</summary>
    public T[] Detach()
    {
        var result = _chunks.Count == 0 && _start == 0 && _used == _current.Length ? _current : ToArray();
        Clear();
        return result;
    }

    /// <summary>Puts a used current run with the others (a new chunk is started at the next <see cref="Add"/>).</summary>
    private void Seal()
    {
        if (_used > 0)
        {
            _chunks.Add((_current, _start, _used));
        }

        (_current, _start, _used, _room) = ([], 0, 0, 0);
    }

    private void Clear()
    {
        _chunks.Clear();
        (_current, _start, _used, _room) = ([], 0, 0, 0);
        Count = 0;
    }
}
