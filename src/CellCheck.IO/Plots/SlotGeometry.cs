using CellCheck.Core.Plots;
using SkiaSharp;

namespace CellCheck.IO.Plots;

/// <summary>Where one panel goes: its header strip and plotting area, its header lines, and which axis parts it draws.</summary>
internal sealed record SlotGeometry(Panel Panel, int Row, int Column, SKRect Header, SKRect Plot, IReadOnlyList<HeaderLine> Lines)
{
    public bool XTickLabels { get; init; }
    public bool YTickLabels { get; init; }
    public bool AxisTitles { get; init; }
}
