namespace CellCheck.Core.Plots;

/// <summary>The symbol of a legend entry.</summary>
public enum LegendKey
{
    /// <summary>A data point.</summary>
    Points,

    /// <summary>A point a check singled out.</summary>
    Highlight,

    /// <summary>The reference line.</summary>
    Reference,

    /// <summary>The simulation envelope.</summary>
    Envelope,

    /// <summary>A fitted line.</summary>
    Fit,

    /// <summary>A block boundary.</summary>
    Boundary,

    /// <summary>The frame and symbol of a flagged panel.</summary>
    Flagged,

    /// <summary>The frame of a panel whose checks could not run.</summary>
    NotTestable,
}
