namespace CellCheck.Core.Analysis;

/// <summary>The data row at each position of a run sequence: listed, or (<see cref="IsIdentity"/>) the position itself,
/// when every row is used in file order (logged data) and no list is kept.</summary>
internal readonly struct RunRows
{
    private readonly int[]? _rows;

    /// <param name="rows">The data row at each position; null for the rows themselves.</param>
    public RunRows(int[]? rows) => _rows = rows;

    /// <summary>True when run position k is data row k.</summary>
    public bool IsIdentity => _rows is null;

    /// <summary>The data row at run position <paramref name="k"/>.</summary>
    public int this[int k] => _rows is null ? k : _rows[k];
}
