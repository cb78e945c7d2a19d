namespace CellCheck.Core.Plots;

/// <summary>
/// One plotting area: its axes, what is drawn in it (in drawing order), an optional title above it, short text lines
/// for its header strip (n, W, adjusted p), a mark (flagged, not testable, empty) and an optional message shown in the
/// plotting area when there is little or nothing to plot.
/// </summary>
public sealed record Panel(Axis X, Axis Y, IReadOnlyList<Series> Series)
{
    /// <summary>Heading above the panel (what is plotted, or which cell), or null.</summary>
    public string? Title { get; init; }

    /// <summary>Short lines for the panel's header strip.</summary>
    public IReadOnlyList<string> Text { get; init; } = [];

    /// <summary>How the panel is marked.</summary>
    public PanelMark Mark { get; init; }

    /// <summary>A message for the plotting area, or null.</summary>
    public string? Message { get; init; }
}
