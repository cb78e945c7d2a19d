using CellCheck.Core.Plots;

namespace CellCheck.IO.Plots;

/// <summary>A legend entry placed: its symbol box's left edge and the line's centre height.</summary>
internal sealed record LegendPlacement(LegendItem Item, float X, float MidY);
