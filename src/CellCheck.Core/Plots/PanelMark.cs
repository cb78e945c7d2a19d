namespace CellCheck.Core.Plots;

/// <summary>How a panel is marked. A renderer must mark with a frame and a symbol, never by colour alone.</summary>
public enum PanelMark
{
    /// <summary>Nothing to mark.</summary>
    None,

    /// <summary>A check flagged this cell (within-cell normality or the outlier screen).</summary>
    Flagged,

    /// <summary>No within-cell check could run; the panel's text gives the reason.</summary>
    NotTestable,

    /// <summary>A combination of levels with no rows.</summary>
    Empty,
}
