namespace CellCheck.Core.Plots;

/// <summary>
/// How the panels are laid out: <see cref="Rows"/> × <see cref="Columns"/> places filled row by row. A factorial grid
/// names its rows (one factor's levels, <see cref="RowTitle"/> and <see cref="RowLabels"/>) and its columns (one
/// header band per remaining factor, outermost first). Shared axes are drawn once, on the outer edges of the grid.
/// </summary>
public sealed record PanelGrid(int Rows, int Columns)
{
    /// <summary>Name of the factor whose levels label the rows; null when rows carry no labels.</summary>
    public string? RowTitle { get; init; }

    /// <summary>One label per row (empty when rows carry no labels).</summary>
    public IReadOnlyList<string> RowLabels { get; init; } = [];

    /// <summary>Column header bands, outermost first; each band's spans add up to <see cref="Columns"/>.</summary>
    public IReadOnlyList<ColumnHeader> ColumnHeaders { get; init; } = [];

    /// <summary>The x axis every panel shares, or null when each panel has its own.</summary>
    public Axis? SharedX { get; init; }

    /// <summary>The y axis every panel shares, or null when each panel has its own.</summary>
    public Axis? SharedY { get; init; }
}
