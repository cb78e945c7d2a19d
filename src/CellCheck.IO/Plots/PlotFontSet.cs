using SkiaSharp;

namespace CellCheck.IO.Plots;

/// <summary>The fonts of one rendering (created per picture, disposed with it).</summary>
internal sealed class PlotFontSet : IDisposable
{
    public SKFont Title { get; } = PlotFonts.Font(PlotMetrics.TitleSize, bold: true);
    public SKFont Subtitle { get; } = PlotFonts.Font(PlotMetrics.SubtitleSize);
    public SKFont Strip { get; } = PlotFonts.Font(PlotMetrics.StripSize, bold: true);
    public SKFont StripName { get; } = PlotFonts.Font(PlotMetrics.StripNameSize);
    public SKFont PanelTitle { get; } = PlotFonts.Font(PlotMetrics.PanelTitleSize, bold: true);
    public SKFont CellTitle { get; } = PlotFonts.Font(PlotMetrics.CellTitleSize, bold: true);
    public SKFont PanelText { get; } = PlotFonts.Font(PlotMetrics.PanelTextSize);
    public SKFont Tick { get; } = PlotFonts.Font(PlotMetrics.TickSize);
    public SKFont AxisTitle { get; } = PlotFonts.Font(PlotMetrics.AxisTitleSize);
    public SKFont Legend { get; } = PlotFonts.Font(PlotMetrics.LegendSize);
    public SKFont Note { get; } = PlotFonts.Font(PlotMetrics.NoteSize);
    public SKFont Message { get; } = PlotFonts.Font(PlotMetrics.MessageSize);
    public SKFont PointLabel { get; } = PlotFonts.Font(PlotMetrics.PointLabelSize, bold: true);
    public SKFont Symbol { get; } = PlotFonts.Font(8f, bold: true);

    /// <summary>Line height of a font.</summary>
    public static float Line(SKFont font) => font.Size * PlotMetrics.Leading;

    public void Dispose()
    {
        foreach (var font in (SKFont[])[Title, Subtitle, Strip, StripName, PanelTitle, CellTitle, PanelText, Tick, AxisTitle, Legend, Note, Message, PointLabel, Symbol])
        {
            font.Dispose();
        }
    }
}
