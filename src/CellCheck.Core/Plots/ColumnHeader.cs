namespace CellCheck.Core.Plots;

/// <summary>One band of column headers: the factor's name and its levels, each spanning one or more columns.</summary>
public sealed record ColumnHeader(string Title, IReadOnlyList<HeaderSpan> Spans);
