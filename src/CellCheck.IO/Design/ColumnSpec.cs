namespace CellCheck.IO.Design;

/// <summary>A factor, response or run-order entry of a design file: the data column, its display name, unit and kind, and where it was written.</summary>
public sealed record ColumnSpec(string Column, string Name, string? Unit, FactorKind Kind, SourceMark Mark);
