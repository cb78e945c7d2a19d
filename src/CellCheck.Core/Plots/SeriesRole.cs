namespace CellCheck.Core.Plots;

/// <summary>What a series is, which decides how a renderer draws it.</summary>
public enum SeriesRole
{
    /// <summary>A simulation envelope (filled band).</summary>
    Envelope,

    /// <summary>A reference line (the QQ line through the quartiles).</summary>
    Reference,

    /// <summary>A zero line or other guide.</summary>
    Guide,

    /// <summary>A line connecting points in run order.</summary>
    Path,

    /// <summary>A fitted line (spread against level).</summary>
    Fit,

    /// <summary>Block boundaries.</summary>
    Boundary,

    /// <summary>Data points.</summary>
    Points,

    /// <summary>Data points a check singled out (outlying rows); drawn with their own symbol.</summary>
    Highlight,
}
