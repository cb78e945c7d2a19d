namespace CellCheck.IO.Data;

/// <summary>
/// An append-only column read row by row, held in fixed chunks so that growing never copies what was read (a
/// doubling list holds up to three times its contents while it grows) and handed over as one exact array at the end.
/// </summary>
internal sealed class ColumnBuffer<T>
{
    private const int ChunkSize = 1 << 16;
    private readonly List<T[]> _chunks = [];
    private T[] _current = [];
    private int _used = ChunkSize;

    public int Count { get; private set; }

    public void Add(T value)
    {
        if (_used == ChunkSize)
        {
            _current = new T[ChunkSize];
            _chunks.Add(_current);
            _used = 0;
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

    /// <summary>Copies the column into one array of exactly <see cref="Count"/> values.</summary>
    public T[] ToArray()
    {
        var result = new T[Count];
        var at = 0;
        foreach (var chunk in _chunks)
        {
            var length = Math.Min(ChunkSize, Count - at);
            Array.Copy(chunk, 0, result, at, length);
            at += length;
        }

        return result;
    }

    /// <summary>Copies the column into one array and releases the chunks (the column is empty afterwards).</summary>
    public T[] Detach()
    {
        var result = ToArray();
        _chunks.Clear();
        _current = [];
        _used = ChunkSize;
        Count = 0;
        return result;
    }
}
