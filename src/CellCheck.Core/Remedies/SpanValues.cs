namespace CellCheck.Core.Remedies;

/// <summary>A span of values read by position through <see cref="IIndexedValues"/>.</summary>
internal readonly ref struct SpanValues(ReadOnlySpan<double> values) : IIndexedValues
{
    private readonly ReadOnlySpan<double> _values = values;

    public double this[int i] => _values[i];
}
