namespace CellCheck.IO.Plots;

/// <summary>Sizes of the pictures, in points (1/72 inch): text sizes, plotting areas, gaps and margins.</summary>
internal static class PlotMetrics
{
    public const float Margin = 18f;
    public const float MinContentWidth = 560f;

    public const float TitleSize = 13.5f;
    public const float SubtitleSize = 8.5f;
    public const float StripSize = 8.5f;
    public const float StripNameSize = 7f;
    public const float PanelTitleSize = 9f;
    public const float CellTitleSize = 7.6f;
    public const float PanelTextSize = 7.4f;
    public const float TickSize = 7.2f;
    public const float AxisTitleSize = 8.5f;
    public const float LegendSize = 8f;
    public const float NoteSize = 7.4f;
    public const float MessageSize = 8f;
    public const float PointLabelSize = 7f;

    /// <summary>Line height as a multiple of the text size.</summary>
    public const float Leading = 1.25f;

    public const float CellPlotWidth = 136f;
    public const float CellPlotHeight = 108f;
    public const float PooledPlotWidth = 292f;
    public const float PooledPlotHeight = 196f;

    public const float SharedGapX = 10f;
    public const float SharedGapY = 12f;
    public const float OwnGapX = 26f;
    public const float OwnGapY = 20f;

    public const float TickLength = 3f;
    public const float BandHeight = 17f;
    public const float StripPad = 6f;
    public const float CellPointRadius = 2.3f;
    public const float PooledPointRadius = 2.1f;
    public const float HighlightRadius = 3.6f;
}
