namespace CellCheck.Core.Plots;

/// <summary>
/// One picture as data: a title and subtitle lines, a grid of panels (row by row), a legend and notes. Everything a
/// renderer needs is here (points, lines, envelopes, axis ranges and ticks, labels, marks); a renderer adds only the
/// look (sizes, colours, fonts) and no statistics.
/// </summary>
public sealed record PlotModel(string Title, IReadOnlyList<string> Subtitle, PanelGrid Grid, IReadOnlyList<Panel> Panels)
{
    /// <summary>What the symbols mean, in the order they should be read.</summary>
    public IReadOnlyList<LegendItem> Legend { get; init; } = [];

    /// <summary>Lines printed under the panels (what is not shown, how the envelope was made).</summary>
    public IReadOnlyList<string> Notes { get; init; } = [];
}
