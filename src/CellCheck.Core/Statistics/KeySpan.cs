namespace CellCheck.Core.Statistics;

/// <summary>The keys a sort works on, handed to each of its workers (a span cannot be shared with a lambda).</summary>
internal delegate Span<ulong> KeySpan();
