namespace CellCheck.Core.Data;

/// <summary>A span of integers read by row through <see cref="IRowValues"/>.</summary>
internal readonly ref struct SpanRowValues(ReadOnlySpan<int> values) : IRowValues
{
    private readonly ReadOnlySpan<int> _values = values;

    public int Length => _values.Length;

    public int this[int row] => _values[row];
}
