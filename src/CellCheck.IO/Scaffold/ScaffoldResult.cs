namespace CellCheck.IO.Scaffold;

/// <summary>The data file (relative to the design file to be written), rows inspected and every column's profile.</summary>
public sealed record ScaffoldResult(string DataFile, int Rows, IReadOnlyList<ColumnProfile> Columns);
